using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Storage;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>The check pipeline over a real store: verdicts device by device, and findings as typed values.</summary>
public sealed class CheckPipelineTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AFailureAndALapsedInstrument_AreTypedFindings_ThatNameTheirRecords(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        store.Import(temp.Write("register.csv", Records.Register), Now);
        store.Import(temp.Write("instruments.csv", "instrument,kind,serial,calibrated_on,calibration_due\nINJ-1,primary injection set,PI-0042,2023-01-10,2024-01-09\n"), Now);

        // Line 4: C16 at 2.56 In tripping after 75 s at the 30 °C reference ambient, past row c's 60 s (IEC 60898-1
        // Table 7); INJ-1 lapsed on 2024-01-09.
        var trips = temp.Write("trips.csv", Records.Trips.ReplaceLineEndings("\n").Replace("40.9,22.5,,cold,21", "40.9,75,,cold,30"));
        store.Import(trips, Now);

        var judged = CheckPipeline.Run(store).ToList();

        Assert.Equal(3, judged.Count);
        var late = judged.Single(j => j.Assessment.Verdict == Verdict.TooLate);
        var outOfBand = Assert.Single(late.Findings, f => f.Kind == FindingKind.TripOutOfBand);
        // Too late: the breaker may not clear its circuit's overload in time, so it comes out of service until repaired.
        Assert.Equal(Severity.OutOfService, outOfBand.Severity);
        Assert.Contains("IEC 60898-1 Table 7 c", outOfBand.Basis);
        Assert.Equal(4, Assert.Single(outOfBand.RestsOn).Line);
        Assert.All(judged, j => Assert.Contains(j.Findings, f => f.Kind == FindingKind.CalibrationLapsed && f.Severity == Severity.Investigate));
        Assert.Equal("trip-out-of-band", TextCodes.FindingKind.Of(outOfBand.Kind));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void OneDeviceOnly_IsReadWhenAsked_AndAnUnknownTagGivesNothing(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        store.Import(temp.Write("register.csv", Records.Register), Now);
        store.Import(temp.Write("trips.csv", Records.Trips), Now);

        Assert.Equal(3, CheckPipeline.Run(store, Domain.Devices.AssetTag.Of("T-01")).Count());
        Assert.Empty(CheckPipeline.Run(store, Domain.Devices.AssetTag.Of("T-02")));
        Assert.Empty(store.Devices(Domain.Devices.AssetTag.Of("NOPE")));
    }
}
