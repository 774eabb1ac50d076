using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>Trip findings over the years: out of band and its repair, drift, trend exits, peers; grades and due dates.</summary>
public sealed class TripFindingsTests
{
    private const string C16 = "iec60898,C,16,1,230,2019-01-01,,,,";
    private const string Tail = ",INJ-1,A. Tester,";

    // IEC 60898-1 Table 7 row c: 2.55 In from cold, 1 s < t < 60 s for In <= 32 A. 40.9 A is 2.556 In of a C16.
    private static string RowC(string tag, string at, double seconds, string stage = "as-found", double ambient = 30) =>
        $"{tag},{at},{stage},all,40.9,{seconds},,cold,{ambient}{Tail}";

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AsLeftPass_AfterAnAsFoundFailure_KeepsTheFailureOpenInTheHistory_UntilAnAsFoundPass(Provider provider)
    {
        using var fleet = new FindingsStore(provider).Register("F-01,Site,Way 1," + C16)
            .Trips(RowC("F-01", "2024-03-18T12:00", 75), RowC("F-01", "2024-03-18T14:00", 22, "as-left"));

        var repaired = Assert.Single(fleet.Device("F-01").Findings, f => f.Kind == FindingKind.TripOutOfBand);

        Assert.True(repaired.Open);
        Assert.Equal(Severity.Investigate, repaired.Severity);
        Assert.Contains("as-left pass", repaired.Standing);
        Assert.Equal(75, repaired.Value!.Value.Amount);
        Assert.Contains("as-found", repaired.Message);

        fleet.Trips(RowC("F-01", "2025-03-18T12:00", 24));
        var closed = Assert.Single(fleet.Device("F-01").Findings, f => f.Kind == FindingKind.TripOutOfBand);

        Assert.False(closed.Open);
        Assert.Contains("closed by the as-found pass", closed.Standing);
        Assert.Equal(new DateOnly(2024, 3, 18), closed.FirstSeen);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ATooLateTrip_WithoutRepair_TakesTheDeviceOutOfService(Provider provider)
    {
        using var fleet = new FindingsStore(provider).Register("F-02,Site,Way 1," + C16).Trips(RowC("F-02", "2026-03-18T12:00", 75));

        var device = fleet.Device("F-02");

        Assert.Equal(ConditionGrade.TakeOutOfService, device.Grade);
        Assert.Equal(Severity.OutOfService, Assert.Single(device.Findings, f => f.Kind == FindingKind.TripOutOfBand).Severity);

        // Lab policy: no interval for that grade, so the retest is due at once; the overdue finding says to repair first.
        var overdue = Assert.Single(device.Findings, f => f.Kind == FindingKind.TestOverdue);
        Assert.Contains("before it returns to service", overdue.Message);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ATimeRisingEachYear_DriftsFromItsBaseline_AndIsForecastToLeaveTheBandBeforeItsNextTest(Provider provider)
    {
        // 20, 25, 31, 39, 48 s at row c, 2021-2025: +140 % on the baseline (log10(48/20) = 0.380 decades), past the 50 %
        // drift policy. The log trend rises ~0.095 decades a year; 60 s is log10(60/48) = 0.097 decades above the last,
        // so about a year on, before the next test (graded watch for the drift: 24 months).
        using var fleet = new FindingsStore(provider).Register("D-01,Site,Way 1," + C16)
            .Trips(RowC("D-01", "2021-03-01T12:00", 20), RowC("D-01", "2022-03-01T12:00", 25), RowC("D-01", "2023-03-01T12:00", 31),
                RowC("D-01", "2024-03-01T12:00", 39), RowC("D-01", "2025-03-01T12:00", 48));

        var device = fleet.Device("D-01", asOf: new DateOnly(2025, 6, 1));
        var drift = Assert.Single(device.Findings, f => f.Kind == FindingKind.TripDrift);
        var exit = Assert.Single(device.Findings, f => f.Kind == FindingKind.TripTrendExit);

        Assert.Equal(140, drift.Value!.Value.Amount, 6);
        Assert.Equal("trip_drift_time_percent = 50", drift.Policy);
        Assert.Equal(new DateOnly(2021, 3, 1), drift.FirstSeen);
        Assert.Equal(Severity.Plan, exit.Severity);
        Assert.InRange(exit.ForecastOn!.Value, new DateOnly(2025, 12, 1), new DateOnly(2026, 8, 1));
        Assert.Equal(60, exit.Limit!.Value.Amount);
        Assert.Contains("Sen 1968", exit.Basis);
        Assert.Equal(ConditionGrade.PlanWork, device.Grade);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TwoTests_AreTooFewForATrend(Provider provider)
    {
        using var fleet = new FindingsStore(provider).Register("D-02,Site,Way 1," + C16)
            .Trips(RowC("D-02", "2024-03-01T12:00", 30), RowC("D-02", "2025-03-01T12:00", 55));

        var device = fleet.Device("D-02", asOf: new DateOnly(2025, 6, 1));

        Assert.Contains(device.Findings, f => f.Kind == FindingKind.TripDrift);
        Assert.DoesNotContain(device.Findings, f => f.Kind == FindingKind.TripTrendExit);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void APeerFarFromItsGroup_IsAnOutlier_OnlyWithEnoughPeers(Provider provider)
    {
        // Eight C16 breakers at row c: seven trip at 19-21.5 s, one at 50 s. Positions on the log band 1-60 s:
        // log10(t) / log10(60); the seven sit near 0.73-0.75, the eighth at 0.955, a modified z-score far above 3.5.
        double[] times = [20, 21, 19, 20.5, 19.5, 20, 21.5, 50];
        var store = new FindingsStore(provider).Register([.. times.Select((_, i) => $"P-{i + 1:00},Site,Way {i + 1}," + C16)]);
        using var fleet = store.Trips([.. times.Select((t, i) => RowC($"P-{i + 1:00}", "2026-03-01T12:00", t, ambient: 30))]);

        var conditions = fleet.Conditions();
        var outliers = conditions.SelectMany(c => c.Findings).Where(f => f.Kind == FindingKind.PeerOutlier).ToList();

        var outlier = Assert.Single(outliers);
        Assert.Equal("P-08", outlier.Asset.Value);
        Assert.True(outlier.Value!.Value.Amount > 3.5);
        Assert.Equal(ReadingUnit.Score, outlier.Value.Value.Unit);
        Assert.Contains("7 peers", outlier.Message);
        Assert.DoesNotContain(fleet.Conditions(FindingPolicy.Default with { PeerMinimumDevices = 9 }).SelectMany(c => c.Findings), f => f.Kind == FindingKind.PeerOutlier);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ADeviceNotTestedWithinItsInterval_IsOverdue_AndAFamilyIntervalCanSayOtherwise(Provider provider)
    {
        using var fleet = new FindingsStore(provider).Register("O-01,Site,Way 1," + C16).Trips(RowC("O-01", "2021-03-01T12:00", 20));

        var device = fleet.Device("O-01");
        var overdue = Assert.Single(device.Findings, f => f.Kind == FindingKind.TestOverdue);

        // Sound: 36 months from 2021-03-01 is 2024-03-01; 2024-03-01 to 2026-12-01 is 1005 days.
        Assert.Equal((ConditionGrade.Sound, new DateOnly(2024, 3, 1)), (device.Grade, device.DueOn));
        Assert.Equal(1005, overdue.Value!.Value.Amount);
        Assert.True(device.Overdue);

        var longer = FindingPolicy.Default with { FamilyDueMonths = new Dictionary<(Domain.Devices.DeviceFamily, ConditionGrade), int> { [(Domain.Devices.DeviceFamily.Iec60898, ConditionGrade.Sound)] = 120 } };
        var relaxed = fleet.Device("O-01", longer);
        Assert.Equal(new DateOnly(2031, 3, 1), relaxed.DueOn);
        Assert.False(relaxed.Overdue);
    }
}
