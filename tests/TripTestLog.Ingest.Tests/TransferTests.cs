using TripTestLog.Application.Import;
using TripTestLog.Application.Transfer;
using TripTestLog.Domain.Devices;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>A store copied into another through <see cref="TransferPipeline"/>: provenance, register history and corrections come along.</summary>
public sealed class TransferTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ACopy_KeepsEveryRecordsFileAndLine_TheRegisterHistory_AndTheCorrections(Provider provider)
    {
        using var temp = new TempFolder();
        using var sourceDb = TestDatabase.Create(Provider.Sqlite, temp.Path);
        Directory.CreateDirectory(Path.Combine(temp.Path, "copy"));
        using var targetDb = TestDatabase.Create(provider, Path.Combine(temp.Path, "copy"));
        using var source = sourceDb.Open();
        using var target = targetDb.Open();

        // A register changed once (two entries for T-02), a trip file corrected with --replace, a contact file.
        source.Import(temp.Write("register.csv", Records.Register), Now);
        source.Import(temp.Write("register-2.csv", Records.Register.Replace("Test Site,Board 1 way 2", "Test Site,Board 3 way 9")), Now.AddDays(1));
        var trips = temp.Write("trips.csv", Records.Trips);
        source.Import(trips, Now);
        File.WriteAllText(trips, Records.Trips.ReplaceLineEndings("\n").Replace("40.9,22.5", "40.9,25.0"));
        Assert.Equal(1L, source.Import(trips, Now.AddDays(2), new ImportOptions(Corrects: "trips.csv")).Replaced);
        source.Import(temp.Write("contact.csv", "asset_tag,tested_at,stage,pole,resistance_uohm,test_current_a\nT-02,2024-03-18T09:30+02:00,as-found,1,1250,100\n"), Now);

        var (files, changes) = new TransferPipeline(source, target).Run();
        var (again, changesAgain) = new TransferPipeline(source, target).Run();

        Assert.Equal((5, 1L), (files.Count, changes));
        Assert.All(files, f => Assert.True(f.Copied));
        Assert.Equal((0, 0L), (again.Count(f => f.Copied), changesAgain));
        Assert.Equal(source.Counts(), target.Counts());
        Assert.Equal(source.Files().Select(f => (f.Name, f.FullPath, f.Sha256, f.Kind, f.RowsRead, f.ImportedAt)),
            target.Files().Select(f => (f.Name, f.FullPath, f.Sha256, f.Kind, f.RowsRead, f.ImportedAt)));
        foreach (var tag in new[] { AssetTag.Of("T-01"), AssetTag.Of("T-02") })
        {
            Assert.Equal(source.Revisions(tag), target.Revisions(tag));
            Assert.Equal(source.Corrections(tag), target.Corrections(tag));
            Assert.Equal(source.Devices(tag, withResistance: true).Single(), target.Devices(tag, withResistance: true).Single(), DeviceRecordsComparer.Instance);
        }

        Assert.Equal(("trip test 2024-03-18T12:00:00 at 40.9 A", "trip_time_s", "22.5", "25"),
            target.Corrections(AssetTag.Of("T-01")).Select(c => (c.Record, c.Column, c.Old, c.New)).Single());
    }

    // Records compare by value; their lists by sequence.
    private sealed class DeviceRecordsComparer : IEqualityComparer<Application.Check.DeviceRecords>
    {
        public static readonly DeviceRecordsComparer Instance = new();

        public bool Equals(Application.Check.DeviceRecords? x, Application.Check.DeviceRecords? y) =>
            x is not null && y is not null && x.History.Entries.SequenceEqual(y.History.Entries) && x.Trips.SequenceEqual(y.Trips)
            && x.Contacts.SequenceEqual(y.Contacts) && x.Insulation.SequenceEqual(y.Insulation);

        public int GetHashCode(Application.Check.DeviceRecords obj) => 0;
    }
}
