using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Codes;

/// <summary>Every text code the tool reads and writes, each spelled once.</summary>
public static class TextCodes
{
    /// <summary>Test stages: as-found, as-left.</summary>
    public static CodeBook<TestStage> Stage { get; } = new("stage", (TestStage.AsFound, "as-found"), (TestStage.AsLeft, "as-left"));

    /// <summary>Start conditions: cold, warm.</summary>
    public static CodeBook<StartCondition> Start { get; } = new("start condition", (StartCondition.Cold, "cold"), (StartCondition.Warm, "warm"));

    /// <summary>Pole loadings: all-poles, one-pole.</summary>
    public static CodeBook<PoleLoading> Loading { get; } = new("pole loading", (PoleLoading.AllPoles, "all-poles"), (PoleLoading.OnePole, "one-pole"));

    /// <summary>Device families.</summary>
    public static CodeBook<DeviceFamily> Family { get; } = new("device family",
        (DeviceFamily.Iec60898, "iec60898"),
        (DeviceFamily.Iec60947Electronic, "iec60947-electronic"),
        (DeviceFamily.Iec60947ThermalMagnetic, "iec60947-thermal-magnetic"),
        (DeviceFamily.RelayIdmt, "relay-idmt"),
        (DeviceFamily.CurveTable, "curve-table"),
        (DeviceFamily.Iec61009, "iec61009"));

    /// <summary>Miniature breaker curves: B, C, D.</summary>
    public static CodeBook<TripCurve> TripCurve { get; } = new("trip curve", (Devices.TripCurve.B, "B"), (Devices.TripCurve.C, "C"), (Devices.TripCurve.D, "D"));

    /// <summary>Supplies: ac, dc.</summary>
    public static CodeBook<Supply> Supply { get; } = new("supply", (Settings.Supply.Ac, "ac"), (Settings.Supply.Dc, "dc"));

    /// <summary>IDMT relay curves.</summary>
    public static CodeBook<IdmtCurve> IdmtCurve { get; } = new("relay curve",
        (Settings.IdmtCurve.StandardInverse, "standard-inverse"),
        (Settings.IdmtCurve.VeryInverse, "very-inverse"),
        (Settings.IdmtCurve.ExtremelyInverse, "extremely-inverse"),
        (Settings.IdmtCurve.LongTimeInverse, "long-time-inverse"),
        (Settings.IdmtCurve.IeeeModeratelyInverse, "ieee-moderately-inverse"),
        (Settings.IdmtCurve.IeeeVeryInverse, "ieee-very-inverse"),
        (Settings.IdmtCurve.IeeeExtremelyInverse, "ieee-extremely-inverse"));

    /// <summary>Verdicts: pass, too-early, too-late, not-assessable.</summary>
    public static CodeBook<Verdict> Verdict { get; } = new("verdict",
        (Verdicts.Verdict.Pass, "pass"), (Verdicts.Verdict.TooEarly, "too-early"), (Verdicts.Verdict.TooLate, "too-late"),
        (Verdicts.Verdict.NotAssessable, "not-assessable"));

    /// <summary>Decision rules: simple, guarded, non-binary.</summary>
    public static CodeBook<DecisionRule> DecisionRule { get; } = new("decision rule",
        (Verdicts.DecisionRule.Simple, "simple"), (Verdicts.DecisionRule.Guarded, "guarded"), (Verdicts.DecisionRule.NonBinary, "non-binary"));

    /// <summary>Statements of conformity: pass, conditional-pass, conditional-fail, fail.</summary>
    public static CodeBook<Conformity> Conformity { get; } = new("conformity",
        (Verdicts.Conformity.Pass, "pass"), (Verdicts.Conformity.ConditionalPass, "conditional-pass"),
        (Verdicts.Conformity.ConditionalFail, "conditional-fail"), (Verdicts.Conformity.Fail, "fail"));

    /// <summary>Finding kinds, as documented in the README.</summary>
    public static CodeBook<FindingKind> FindingKind { get; } = new("finding kind",
        (Codes.FindingKind.TripOutOfBand, "trip-out-of-band"),
        (Codes.FindingKind.TripDrift, "trip-drift"),
        (Codes.FindingKind.TripTrendExit, "trip-trend-exit"),
        (Codes.FindingKind.PeerOutlier, "peer-outlier"),
        (Codes.FindingKind.ContactOverLimit, "contact-over-limit"),
        (Codes.FindingKind.ContactPoleSpread, "contact-pole-spread"),
        (Codes.FindingKind.ContactRise, "contact-rise"),
        (Codes.FindingKind.ContactTrendLimit, "contact-trend-limit"),
        (Codes.FindingKind.ContactLowTestCurrent, "contact-low-test-current"),
        (Codes.FindingKind.InsulationBelowMinimum, "insulation-below-minimum"),
        (Codes.FindingKind.InsulationFalling, "insulation-falling"),
        (Codes.FindingKind.CalibrationLapsed, "calibration-lapsed"),
        (Codes.FindingKind.InstrumentUnregistered, "instrument-unregistered"),
        (Codes.FindingKind.SettingsDiffer, "settings-differ"),
        (Codes.FindingKind.TestOverdue, "test-overdue"),
        (Codes.FindingKind.RetestNeeded, "retest-needed"),
        (Codes.FindingKind.InsulationTestVoltage, "insulation-test-voltage"),
        (Codes.FindingKind.RetestAccuracy, "retest-accuracy"));

    /// <summary>Finding severities, in rising order.</summary>
    public static CodeBook<Severity> Severity { get; } = new("severity",
        (Codes.Severity.Investigate, "investigate"), (Codes.Severity.Plan, "plan"), (Codes.Severity.Act, "act"), (Codes.Severity.OutOfService, "out-of-service"));

    /// <summary>Condition grades, best first.</summary>
    public static CodeBook<ConditionGrade> Grade { get; } = new("condition grade",
        (ConditionGrade.Sound, "sound"), (ConditionGrade.Watch, "watch"), (ConditionGrade.PlanWork, "plan-work"),
        (ConditionGrade.Untested, "untested"), (ConditionGrade.Repair, "repair"), (ConditionGrade.TakeOutOfService, "take-out-of-service"));

    /// <summary>Insulation minimum tables a lab may choose.</summary>
    public static CodeBook<InsulationTable> InsulationTable { get; } = new("insulation table",
        (Condition.InsulationTable.NetaMaintenance, "neta"), (Condition.InsulationTable.Iec60364Installation, "iec60364-6"));

    /// <summary>Rules that refer insulation readings to 20 °C.</summary>
    public static CodeBook<InsulationCorrectionRule> InsulationCorrection { get; } = new("insulation correction",
        (InsulationCorrectionRule.HalvingPer10K, "halving-10k"), (InsulationCorrectionRule.SolidInsulation, "solid-insulation"),
        (InsulationCorrectionRule.None, "none"));

    /// <summary>What a lab does with readings from an instrument not traceable on the day, in trends and charts.</summary>
    public static CodeBook<UntraceableReadings> UntraceableReadings { get; } = new("untraceable readings",
        (Condition.UntraceableReadings.Mark, "mark"), (Condition.UntraceableReadings.Exclude, "exclude"));
}
