using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>
/// Findings a person can act on: a limit compared at a stated precision, a settings change that restarts the trend,
/// a device never tested, a forecast already past, an action that is done, and drift judged where the band gives room.
/// </summary>
public sealed class ActionableFindingsTests
{
    private const string C16 = "iec60898,C,16,1,230,2019-01-01,,,,";
    private const string C16Limited = "iec60898,C,16,3,400,2019-01-01,6750,,,";
    private const string Tail = ",INJ-1,A. Tester,";

    // IEC 60898-1 Table 7 row c: 2.55 In from cold, 1 s < t < 60 s for In <= 32 A. 40.9 A is 2.556 In of a C16.
    private static string RowC(string tag, string at, double seconds, string stage = "as-found") =>
        $"{tag},{at},{stage},all,40.9,{seconds},,cold,30{Tail}";

    private static string Pole(string tag, string at, int pole, double uohm, double celsius, string stage = "as-found") =>
        FormattableString.Invariant($"{tag},{at},{stage},{pole},{uohm},10,{celsius},OHM-1,A. Tester");

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void PolesAtExactlyFiftyPerCentAbovetheLowest_AreNotFlagged_EvenAfterATemperatureCorrection(Provider provider)
    {
        // ANSI/NETA maintenance testing specifications, customary guide: investigate a pole more than 50 % above the
        // lowest. 1500 / 1000 is exactly 50 %; each pole divided by the same copper factor at 15 °C (IEC 60228,
        // alpha 0.00393, from memory) gives 50.000000000000014 % in floating point: compared at 1e-9 %, not flagged.
        // 1501 / 1000 is 50.1 %: flagged.
        using var fleet = new FindingsStore(provider).Register("S-01,Site,Way 1," + C16Limited, "S-02,Site,Way 2," + C16Limited)
            .Contacts(Pole("S-01", "2026-03-01T10:00", 1, 1000, 15), Pole("S-01", "2026-03-01T10:00", 2, 1100, 15), Pole("S-01", "2026-03-01T10:00", 3, 1500, 15),
                Pole("S-02", "2026-03-01T10:00", 1, 1000, 15), Pole("S-02", "2026-03-01T10:00", 2, 1100, 15), Pole("S-02", "2026-03-01T10:00", 3, 1501, 15));

        Assert.DoesNotContain(fleet.Device("S-01").Findings, f => f.Kind == FindingKind.ContactPoleSpread);
        var past = Assert.Single(fleet.Device("S-02").Findings, f => f.Kind == FindingKind.ContactPoleSpread);
        Assert.Equal(50.1, past.Value!.Value.Amount, 6);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ASettingsChange_RestartsTheTripBaselineAndTrend(Provider provider)
    {
        // An electronic unit's tr goes from 10 s to 5 s in a register revision on 2024-01-01 (IEC 60947-2, the long-time
        // delay at its reference multiple, 6 Ir by default). Tests at 6 Ir (3000 A for Ir 500 A): 10.2 s and 10.1 s,
        // then 5.1 s and 5.05 s. Against the first test that is -50 %, but the settings moved, not the breaker.
        using var fleet = new FindingsStore(provider).Records(
                "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,settings_from,ir_a,tr_s",
                "E-01,Site,Incomer,iec60947-electronic,,630,3,400,2019-01-01,500,10",
                "E-01,Site,Incomer,iec60947-electronic,,630,3,400,2024-01-01,500,5")
            .Trips("E-01,2022-03-01T10:00,as-found,all,3000,10.2,,cold,20" + Tail, "E-01,2023-03-01T10:00,as-found,all,3000,10.1,,cold,20" + Tail,
                "E-01,2025-03-01T10:00,as-found,all,3000,5.1,,cold,20" + Tail, "E-01,2026-03-01T10:00,as-found,all,3000,5.05,,cold,20" + Tail);

        var device = fleet.Device("E-01");

        Assert.DoesNotContain(device.Findings, f => f.Kind is FindingKind.TripDrift or FindingKind.TripTrendExit);
        Assert.Equal(ConditionGrade.Sound, device.Grade);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ADeviceNeverTested_IsUntested_AndDueSinceItsCommissioning(Provider provider)
    {
        // Lab policy default due_months.untested = 0: a first as-found test at commissioning (common practice, no source).
        using var fleet = new FindingsStore(provider).Register("U-01,Site,Way 1," + C16, "U-02,Site,Way 2," + C16)
            .Trips(RowC("U-02", "2026-03-01T12:00", 20));

        var device = fleet.Device("U-01");
        var overdue = Assert.Single(device.Findings, f => f.Kind == FindingKind.TestOverdue);

        Assert.Equal(ConditionGrade.Untested, device.Grade);
        Assert.Equal(new DateOnly(2019, 1, 1), device.DueOn);
        Assert.StartsWith("never tested; due since 2019-01-01", overdue.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("tested 2", overdue.Message, StringComparison.Ordinal);
        Assert.Equal("untested", TextCodes.Grade.Of(device.Grade));
        Assert.Equal(ConditionGrade.Sound, fleet.Device("U-02").Grade);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AForecastBeforeTheDayJudged_SaysTheBandIsProbablyLeft_AndBringsTheTestForwardToThatDay(Provider provider)
    {
        // 20, 25, 31, 39, 48 s at row c, 2021-2025 (IEC 60898-1 Table 7 row c, 60 s limit): the log trend reaches 60 s
        // about a year after the last test, around 2026-03. Judged on 2025-06-01 that is ahead; on 2026-12-01 it is past.
        using var fleet = new FindingsStore(provider).Register("F-01,Site,Way 1," + C16)
            .Trips(RowC("F-01", "2021-03-01T12:00", 20), RowC("F-01", "2022-03-01T12:00", 25), RowC("F-01", "2023-03-01T12:00", 31),
                RowC("F-01", "2024-03-01T12:00", 39), RowC("F-01", "2025-03-01T12:00", 48));

        var ahead = fleet.Device("F-01", asOf: new DateOnly(2025, 6, 1));
        var aheadExit = Assert.Single(ahead.Findings, f => f.Kind == FindingKind.TripTrendExit);
        Assert.Contains($"the next test is due ({ahead.DueOn:yyyy-MM-dd})", aheadExit.Message, StringComparison.Ordinal);

        var past = fleet.Device("F-01", asOf: new DateOnly(2026, 12, 1));
        var pastExit = Assert.Single(past.Findings, f => f.Kind == FindingKind.TripTrendExit);
        Assert.True(pastExit.ForecastOn < new DateOnly(2026, 12, 1));
        Assert.Contains("probably left the band since about", pastExit.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("the next test is due", pastExit.Message, StringComparison.Ordinal);
        // Its test was already due (2026-03-01, before the day judged): the past forecast never moves it later.
        Assert.True(past.DueOn <= new DateOnly(2026, 12, 1));
        Assert.True(past.Overdue);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ADeviceCleanedWithAGoodAsLeftReading_NoLongerAsksToBeCleaned(Provider provider)
    {
        // Pole 1 at 7000 uOhm at 20 °C against the maker's 6750 uOhm limit, then cleaned: as-left 3000 uOhm.
        using var fleet = new FindingsStore(provider).Register("W-01,Site,Way 1," + C16Limited)
            .Contacts(Pole("W-01", "2026-03-01T10:00", 1, 7000, 20), Pole("W-01", "2026-03-01T10:00", 2, 3000, 20),
                Pole("W-01", "2026-03-01T14:00", 1, 3000, 20, "as-left"), Pole("W-01", "2026-03-01T14:00", 2, 3000, 20, "as-left"));

        var device = fleet.Device("W-01");
        var over = Assert.Single(device.Findings, f => f.Kind == FindingKind.ContactOverLimit);

        Assert.Equal(ConditionGrade.Watch, device.Grade);
        Assert.DoesNotContain("clean and re-torque", over.Message, StringComparison.Ordinal);
        Assert.Contains("over the limit of 6750 µΩ", over.Message, StringComparison.Ordinal);
        Assert.Contains("repaired", over.Message, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AnInstantaneousTripsMilliseconds_AreNoDrift(Provider provider)
    {
        // IEC 60898-1 Table 7 row e: curve C at 10 In trips in under 0.1 s, with no earliest time: the band gives no room
        // to drift, so 8 ms to 12 ms (+50 %) is no finding.
        using var fleet = new FindingsStore(provider).Register("I-01,Site,Way 1," + C16)
            .Trips("I-01,2024-03-01T10:00,as-found,all,160,0.008,,cold,20" + Tail, "I-01,2026-03-01T10:00,as-found,all,160,0.012,,cold,20" + Tail);

        Assert.DoesNotContain(fleet.Device("I-01").Findings, f => f.Kind == FindingKind.TripDrift);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ADrift_PrintsWhatTheRuleCompares(Provider provider)
    {
        // 50 s to 30 s at row c is -40 % as a plain change, but the rule compares the slower over the faster on a log
        // scale: 50 / 30 = 1.67, past 1.50. The finding carries 66.7 % against 50 %, and its text the factor.
        using var fleet = new FindingsStore(provider).Register("R-01,Site,Way 1," + C16)
            .Trips(RowC("R-01", "2024-03-01T12:00", 50), RowC("R-01", "2026-03-01T12:00", 30));

        var drift = Assert.Single(fleet.Device("R-01").Findings, f => f.Kind == FindingKind.TripDrift);

        Assert.Equal(100 * (50.0 / 30 - 1), drift.Value!.Value.Amount, 6);
        Assert.Equal(50, drift.Limit!.Value.Amount);
        Assert.Contains("faster by a factor of 1.67", drift.Message, StringComparison.Ordinal);
        Assert.Contains("limit: 1.50", drift.Message, StringComparison.Ordinal);
    }
}
