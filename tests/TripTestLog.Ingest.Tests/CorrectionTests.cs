using TripTestLog.Application.Import;
using TripTestLog.Application.Stores;
using TripTestLog.Domain.Devices;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>
/// A correction is a deliberate act on one named earlier file; two files at the same path are two files. Behaviour of
/// the project's own design (docs/record-formats.md, "Duplicates and corrections"), no outside source.
/// </summary>
public sealed class CorrectionTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    // Five trip tests on lines 2 to 6.
    private const string Five = """
        asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,instrument
        T-01,2024-03-18T09:00,as-found,all,18.2,,3600,cold,INJ-1
        T-01,2024-03-18T10:00,as-found,all,23.3,1500,,warm,INJ-1
        T-01,2024-03-18T11:00,as-found,all,40.9,22.5,,cold,INJ-1
        T-01,2024-03-18T12:00,as-found,all,80.1,0.02,,cold,INJ-1
        T-02,2024-03-18T13:00,as-found,all,200,0.01,,cold,INJ-1
        """;

    private static (IRecordStore Store, TestDatabase Db) Open(TempFolder temp, TestDatabase database)
    {
        var store = database.Open();
        store.Import(temp.Write("register.csv", Records.Register), Now);
        return (store, database);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TwoLabsFiles_AtTheSamePath_AreTwoFiles_AndNeitherRemovesTheOthersRecords(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var _ = store;
        Directory.CreateDirectory(Path.Combine(temp.Path, "export"));
        var path = temp.Write("export/trips.csv", Five);
        store.Import(path, Now);

        // The other lab's test set writes the same name: other devices' values on the same lines.
        File.WriteAllText(path, Five.ReplaceLineEndings("\n").Replace("T-01,", "T-02,", StringComparison.Ordinal).Replace(",cold,", ",warm,", StringComparison.Ordinal));
        var second = store.Import(path, Now.AddHours(1));

        Assert.Equal((ImportStatus.Imported, 5L, 0L, 0L), (second.Status, second.Added, second.Replaced, second.Duplicates));
        Assert.Empty(second.Problems);
        Assert.Null(second.Correction);
        Assert.Equal(10, db.Count("SELECT COUNT(*) FROM trip_tests"));
        Assert.Equal(4, db.Count("SELECT COUNT(*) FROM trip_tests t JOIN devices d ON d.id = t.device_id WHERE d.asset_tag = 'T-01'"));
        Assert.Empty(store.Changes());
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ACorrection_WithOneRowDeletedAndOneChanged_ReportsExactlyThat_AndKeepsTheDeletedRecord(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var _ = store;
        var path = temp.Write("trips.csv", Five);
        store.Import(path, Now);
        var lines = Five.ReplaceLineEndings("\n").Split('\n').ToList();
        lines.RemoveAt(2); // the 10:00 test, line 3
        File.WriteAllText(path, string.Join('\n', lines).Replace("80.1,0.02", "80.1,0.03", StringComparison.Ordinal));

        var corrected = store.Import(path, Now.AddHours(1), new ImportOptions(Corrects: "trips.csv"));

        Assert.Equal(ImportStatus.Imported, corrected.Status);
        Assert.Empty(corrected.Problems);
        Assert.Equal((4L, 0L, 1L, 3L, 0L), (corrected.RowsRead, corrected.Added, corrected.Replaced, corrected.Unchanged, corrected.Duplicates));
        Assert.Equal((path, 1L), (corrected.Correction!.File, corrected.Correction.Kept));
        Assert.Equal([3L], corrected.Correction.KeptLines);
        Assert.Equal(5, db.Count("SELECT COUNT(*) FROM trip_tests"));
        Assert.Equal(1, db.Count("SELECT COUNT(*) FROM trip_tests WHERE time_s = 0.03"));
        Assert.Equal(0, db.Count("SELECT COUNT(*) FROM trip_tests WHERE time_s = 0.02"));
        var change = Assert.Single(store.Changes());
        Assert.Equal(("trip_tests", "time_s", "0.02", "0.03"), (change.Table, change.Column, change.Old, change.New));

        // The records the correction holds cite it at their new lines; the deleted one still cites the first import.
        Assert.Equal(4, db.Count("SELECT COUNT(*) FROM trip_tests t JOIN source_files f ON f.id = t.source_file_id WHERE f.id = (SELECT MAX(id) FROM source_files)"));
        Assert.Equal(4, db.Count("SELECT source_line FROM trip_tests WHERE time_s = 0.03"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ACorrection_ThatMovesADevice_NamesTheTags_NotInternalIds(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, _) = Open(temp, database);
        using var s = store;
        var path = temp.Write("trips.csv", Five);
        store.Import(path, Now);
        File.WriteAllText(path, Five.ReplaceLineEndings("\n").Replace("T-01,2024-03-18T11:00", "T-02,2024-03-18T11:00", StringComparison.Ordinal));

        var corrected = store.Import(path, Now.AddHours(1), new ImportOptions(Corrects: Path.GetFullPath(path)));

        Assert.Equal(1L, corrected.Replaced);
        var change = Assert.Single(store.Corrections(AssetTag.Of("T-02")));
        Assert.Equal(("asset_tag", "T-01", "T-02"), (change.Column, change.Old, change.New));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AReplace_ThatFitsTwoEarlierFiles_IsRefused_NamingTheirHashes_AndTheHashChoosesOne(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var _ = store;
        var path = temp.Write("trips.csv", Five);
        store.Import(path, Now);
        File.WriteAllText(path, Five.ReplaceLineEndings("\n").Replace("T-01,", "T-02,", StringComparison.Ordinal));
        store.Import(path, Now);
        File.WriteAllText(path, Five.ReplaceLineEndings("\n").Replace("80.1,0.02", "80.1,0.03", StringComparison.Ordinal));

        var ambiguous = store.Import(path, Now, new ImportOptions(Corrects: "trips.csv"));
        var unknown = store.Import(path, Now, new ImportOptions(Corrects: "other.csv"));
        var first = store.Files().First(f => f.Name == path);
        var chosen = store.Import(path, Now, new ImportOptions(Corrects: first.Sha256[..10]));

        Assert.Equal(ImportStatus.Refused, ambiguous.Status);
        Assert.Contains("fits 2 earlier trip-test files", Assert.Single(ambiguous.Problems).Reason);
        Assert.Contains(first.Sha256[..12], ambiguous.Problems[0].Reason);
        Assert.Equal(ImportStatus.Refused, unknown.Status);
        Assert.Contains("no earlier trip-test file has that name", Assert.Single(unknown.Problems).Reason);
        Assert.Equal((ImportStatus.Imported, 1L, 4L), (chosen.Status, chosen.Replaced, chosen.Unchanged));
        Assert.Equal(9, db.Count("SELECT COUNT(*) FROM trip_tests")); // the second file's T-02 line repeats the first's
    }
}
