using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>
/// Findings and grades under the lab's decision rule (ILAC-G8:09/2019), with the accuracy read from the instrument
/// register: each ±a rectangular, u = a / √3 (GUM, JCGM 100:2008, 4.3.7), U = k u.
/// </summary>
public sealed class DecisionRuleFindingsTests
{
    private static FindingPolicy Rule(DecisionRule rule) => FindingPolicy.Default with { DecisionRule = rule };

    // A micro-ohm meter accurate to ±(1 % + 1 uOhm) and a test set with a timer of ±(0.5 % + 10 ms), its current taken as exact; k = 2.
    private static FindingsStore Fleet(Provider provider) => new FindingsStore(provider)
        .Register("K-99,Site,Way 1,iec60898,C,16,1,230,2019-01-01,8000,,,", "K-101,Site,Way 2,iec60898,C,16,1,230,2019-01-01,8000,,,",
            "T-60,Site,Way 3,iec60898,C,16,1,230,2019-01-01,,,,")
        .Instruments("OHM-1,micro-ohm meter,MO-7,2026-01-05,2027-01-04,,,,,1,1,,2",
            "INJ-1,primary injection set,PI-9,2026-01-05,2027-01-04,0.5,0.01,0,0,,,,2")
        .Contacts("K-99,2026-03-01,as-found,1,7920,10,20,OHM-1,A. Tester", "K-101,2026-03-01,as-found,1,8080,10,20,OHM-1,A. Tester")
        .Trips("T-60,2026-03-01T09:00,as-found,all,40.8,59.9,,cold,30,INJ-1,A. Tester,");

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AContactReadingOnePerCentUnderItsLimit_IsWithinTheUncertainty_UnderGuarded(Provider provider)
    {
        // 7920 uOhm against 8000 (1 % under): a = 0.01 x 7920 + 1 = 80.2 uOhm, u = 46.30, U = 92.61 uOhm > 80 uOhm.
        using var fleet = Fleet(provider);

        var simple = fleet.Device("K-99", Rule(DecisionRule.Simple));
        var guarded = fleet.Device("K-99", Rule(DecisionRule.Guarded));
        var nonBinary = fleet.Device("K-99", Rule(DecisionRule.NonBinary));

        Assert.DoesNotContain(simple.Findings, f => f.Kind is FindingKind.ContactOverLimit or FindingKind.RetestAccuracy);
        Assert.Equal(ConditionGrade.Sound, simple.Grade);
        var retest = Assert.Single(guarded.Findings, f => f.Kind == FindingKind.RetestAccuracy);
        Assert.Contains("U = 92.61 µΩ", retest.Message);
        Assert.Contains("retest with a more accurate instrument", retest.Message);
        Assert.Equal(("1", Severity.Investigate, "OHM-1"), (retest.Pole, retest.Severity, retest.Instrument));
        Assert.Equal(ConditionGrade.Watch, guarded.Grade);
        Assert.DoesNotContain(nonBinary.Findings, f => f.Kind == FindingKind.ContactOverLimit);
        Assert.Single(nonBinary.Findings, f => f.Kind == FindingKind.RetestAccuracy);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AContactReadingOnePerCentOverItsLimit_FailsOnlyUnderSimpleAndNonBinary(Provider provider)
    {
        // 8080 uOhm: a = 81.8 uOhm, U = 94.45 uOhm > 80 uOhm past the limit. Guarded withholds the failure; non-binary
        // keeps it (a conditional fail) and asks for a retest too.
        using var fleet = Fleet(provider);

        Assert.Single(fleet.Device("K-101", Rule(DecisionRule.Simple)).Findings, f => f.Kind == FindingKind.ContactOverLimit);
        var guarded = fleet.Device("K-101", Rule(DecisionRule.Guarded));
        Assert.DoesNotContain(guarded.Findings, f => f.Kind == FindingKind.ContactOverLimit);
        Assert.Contains("U = 94.45 µΩ", Assert.Single(guarded.Findings, f => f.Kind == FindingKind.RetestAccuracy).Message);
        var nonBinary = fleet.Device("K-101", Rule(DecisionRule.NonBinary));
        Assert.Single(nonBinary.Findings, f => f.Kind == FindingKind.ContactOverLimit);
        Assert.Single(nonBinary.Findings, f => f.Kind == FindingKind.RetestAccuracy);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AnInsulationReadingTwoPerCentUnderItsMinimum_FailsOnlyUnderSimpleAndNonBinary(Provider provider)
    {
        // A 230 V breaker against the default table's 25 MOhm minimum (ANSI/NETA maintenance table, from memory) reads
        // 24.5 MOhm at 20 °C. The record names no tester, so the policy default ±5 % applies (lab policy):
        // a = 0.05 x 24.5 = 1.225 MOhm, u = 1.225 / √3 = 0.7073 MOhm, U = 1.41 MOhm > the 0.5 MOhm it is under by.
        using var fleet = new FindingsStore(provider)
            .Register("I-25,Site,Way 4,iec60898,C,16,1,230,2019-01-01,,,,")
            .Insulation("I-25,2026-03-01,as-found,1-E,500,24.5,20,60");

        Assert.Single(fleet.Device("I-25", Rule(DecisionRule.Simple)).Findings, f => f.Kind == FindingKind.InsulationBelowMinimum);
        var guarded = fleet.Device("I-25", Rule(DecisionRule.Guarded));
        Assert.DoesNotContain(guarded.Findings, f => f.Kind == FindingKind.InsulationBelowMinimum);
        var retest = Assert.Single(guarded.Findings, f => f.Kind == FindingKind.RetestAccuracy);
        Assert.Contains("U = 1.41 MΩ", retest.Message);
        Assert.Contains("insulation ±5 %", retest.Message);
        var nonBinary = fleet.Device("I-25", Rule(DecisionRule.NonBinary));
        Assert.Single(nonBinary.Findings, f => f.Kind == FindingKind.InsulationBelowMinimum);
        Assert.Single(nonBinary.Findings, f => f.Kind == FindingKind.RetestAccuracy);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ATripAt59_9sAgainstRowC_OpensARetestWithABetterInstrument_UnderGuarded(Provider provider)
    {
        // IEC 60898-1 Table 7 c, C16 at 2.55 In from cold: t < 60 s. U = 2 x (0.005 x 59.9 + 0.01) / √3 = 0.3574 s > 0.1 s.
        using var fleet = Fleet(provider);

        var simple = fleet.Device("T-60", Rule(DecisionRule.Simple));
        var guarded = fleet.Device("T-60", Rule(DecisionRule.Guarded));

        Assert.DoesNotContain(simple.Findings, f => f.Kind is FindingKind.RetestAccuracy or FindingKind.RetestNeeded);
        var retest = Assert.Single(guarded.Findings, f => f.Kind == FindingKind.RetestAccuracy);
        Assert.Contains("U = 0.3574 s", retest.Message);
        Assert.DoesNotContain(guarded.Findings, f => f.Kind == FindingKind.RetestNeeded);
        Assert.Equal(ConditionGrade.Watch, guarded.Grade);
        Assert.Equal("retest-accuracy", TextCodes.FindingKind.Of(retest.Kind));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TheRegistersAccuracyColumns_AreStoredAndReadBack(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        store.Import(temp.Write("instruments.csv",
            "instrument,kind,serial,calibrated_on,calibration_due,time_accuracy_pct,time_accuracy_s,current_accuracy_pct,current_accuracy_a,"
            + "resistance_accuracy_pct,resistance_accuracy_uohm,insulation_accuracy_pct,coverage_factor\n"
            + "INJ-1,primary injection set,PI-9,2026-01-05,2027-01-04,0.25,0.002,1.5,0.05,,,,2.5\n"
            + "IR-1,insulation tester,IR-3,2026-01-05,2027-01-04,,,,,,,3,\n"
            + "OLD-1,primary injection set,PI-1,2026-01-05,2027-01-04,,,,,,,,\n"), new DateTimeOffset(2026, 12, 1, 9, 0, 0, TimeSpan.Zero));

        var register = store.Instruments();
        var on = new DateOnly(2026, 6, 1);

        Assert.Equal(Domain.Instruments.InstrumentAccuracy.Of(0.25, 0.002, 1.5, 0.05, coverageFactor: 2.5), register.AccuracyOn("INJ-1", on));
        Assert.Equal(Domain.Instruments.InstrumentAccuracy.Of(insulationPercent: 3), register.AccuracyOn("IR-1", on));
        Assert.True(register.AccuracyOn("OLD-1", on).IsEmpty);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AnAccuracyOutOfRange_IsRefusedWithItsLineAndColumn(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();

        var outcome = store.Import(temp.Write("instruments.csv",
            "instrument,kind,serial,calibrated_on,calibration_due,time_accuracy_pct\nINJ-1,primary injection set,PI-9,2026-01-05,2027-01-04,150\n"),
            new DateTimeOffset(2026, 12, 1, 9, 0, 0, TimeSpan.Zero));

        var problem = Assert.Single(outcome.Problems);
        Assert.Equal((2L, "time_accuracy_pct"), (problem.Line, problem.Column));
    }
}
