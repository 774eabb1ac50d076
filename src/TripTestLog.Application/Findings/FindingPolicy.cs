using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Every threshold the findings use, with the shipped defaults. A lab overrides them in a policy file
/// (<see cref="PolicyFile"/>); each default says where it comes from: a source, common practice, or lab policy.
/// </summary>
public sealed record FindingPolicy
{
    /// <summary>The shipped defaults.</summary>
    public static FindingPolicy Default { get; } = new();

    /// <summary>trip-drift: a move of the trip time from baseline, either way, in per cent (lab policy: 50).</summary>
    public double TripDriftTimePercent { get; init; } = 50;

    /// <summary>trip-drift: a move of the position within the band, in per cent of the band's log width (lab policy: 30).</summary>
    public double TripDriftBandPercent { get; init; } = 30;

    /// <summary>The fewest as-found tests at distinct dates a trend rests on (lab policy: 3, the fewest that show a direction and its scatter).</summary>
    public int TrendMinimumTests { get; init; } = 3;

    /// <summary>How far past the latest test a trend may be extrapolated, in years (lab policy: 5).</summary>
    public double ForecastHorizonYears { get; init; } = 5;

    /// <summary>A trip trend whose scatter exceeds this share of the band's log width is marked uncertain (lab policy: 20 %).</summary>
    public double TripTrendScatterBandPercent { get; init; } = 20;

    /// <summary>A contact trend whose scatter exceeds this share of the limit is marked uncertain (lab policy: 10 %).</summary>
    public double ContactTrendScatterPercent { get; init; } = 10;

    /// <summary>peer-outlier: the fewest devices in a peer group, the device included (lab policy: 8).</summary>
    public int PeerMinimumDevices { get; init; } = 8;

    /// <summary>peer-outlier: the modified z-score beyond which a result is an outlier (Iglewicz and Hoaglin, 1993: 3.5).</summary>
    public double PeerScoreLimit { get; init; } = 3.5;

    /// <summary>
    /// peer-outlier: the least distance from the peers' median, in per cent of the band's log width (lab policy: 10), so a
    /// very consistent group does not flag a difference of no consequence.
    /// </summary>
    public double PeerMinimumBandPercent { get; init; } = 10;

    /// <summary>contact-pole-spread: a pole this many per cent above the lowest pole (ANSI/NETA customary guide: 50).</summary>
    public double ContactSpreadPercent { get; init; } = 50;

    /// <summary>contact-rise: a rise over the pole's baseline, in per cent (lab policy: 50).</summary>
    public double ContactRisePercent { get; init; } = 50;

    /// <summary>contact-low-test-current: the least DC test current below <see cref="ContactLargeRating"/> (common practice: 10 A).</summary>
    public double ContactCurrentSmallAmperes { get; init; } = 10;

    /// <summary>contact-low-test-current: the least DC test current at and above <see cref="ContactLargeRating"/> (common practice: 100 A).</summary>
    public double ContactCurrentLargeAmperes { get; init; } = 100;

    /// <summary>The rating from which the larger test current applies (common practice: 100 A).</summary>
    public double ContactLargeRating { get; init; } = 100;

    /// <summary>
    /// The DC test current for a contact resistance test on a breaker rated <paramref name="rated"/> A, and the policy
    /// setting it comes from: the larger current at and above <see cref="ContactLargeRating"/>, else the smaller.
    /// </summary>
    public (double Amperes, string Setting) ContactTestCurrent(double rated) => rated >= ContactLargeRating
        ? (ContactCurrentLargeAmperes, "contact_current_large_a")
        : (ContactCurrentSmallAmperes, "contact_current_small_a");

    /// <summary>insulation-below-minimum: the table of minimums (default: the ANSI/NETA maintenance table).</summary>
    public InsulationTable InsulationTable { get; init; } = InsulationTable.NetaMaintenance;

    /// <summary>
    /// How insulation readings are referred to 20 °C (default: halving per 10 K, common practice); see
    /// <see cref="Domain.Condition.InsulationCorrection"/> for each rule and where it comes from.
    /// </summary>
    public InsulationCorrectionRule InsulationCorrection { get; init; } = InsulationCorrectionRule.HalvingPer10K;

    /// <summary>What trends and charts do with readings from an instrument not traceable on the day (default: mark them).</summary>
    public UntraceableReadings UntraceableReadings { get; init; } = UntraceableReadings.Mark;

    /// <summary>insulation-falling: a trend falling faster than this, in per cent a year (lab policy: 20).</summary>
    public double InsulationFallPercentPerYear { get; init; } = 20;

    /// <summary>How far the test ambient may lie from the reference before a thermal verdict carries a note, in kelvin (lab policy: 15).</summary>
    public double AmbientNoteKelvin { get; init; } = 15;

    /// <summary>
    /// The test-current tolerance within which a test is a test of a standard's point, in per cent of the point's current
    /// (lab policy: 3; no standard figure is used).
    /// </summary>
    public double PointWindowPercent { get; init; } = LabPolicy.PointWindow * 100;

    /// <summary>
    /// How verdicts and limits take the measurement uncertainty into account (ILAC-G8:09/2019): simple (the limit as
    /// written, the default, so no verdict changes unasked), guarded or non-binary.
    /// </summary>
    public DecisionRule DecisionRule { get; init; } = DecisionRule.Simple;

    /// <summary>The guard band w as a multiple of the expanded uncertainty U (lab policy: 1, w = U, as ILAC-G8 describes).</summary>
    public double GuardBandFactor { get; init; } = 1;

    /// <summary>The accuracy assumed where the instrument register states none (<see cref="LabPolicy.DefaultAccuracy"/>).</summary>
    public InstrumentAccuracy DefaultAccuracy { get; init; } = LabPolicy.DefaultAccuracy;

    /// <summary>The decision rule, guard band and default accuracies as the judge takes them.</summary>
    public DecisionPolicy Decision => new(DecisionRule, DefaultAccuracy, GuardBandFactor);

    /// <summary>Whether a test made with an instrument missing from the register is a finding (default: no).</summary>
    public bool RequireRegisteredInstruments { get; init; }

    /// <summary>
    /// Minutes a command waits for another process's write to the store (a SQLite file's write lock, the server's import
    /// or schema lock) before it gives up with one sentence; it says on stderr what it waits for. Lab policy; 10 by default.
    /// </summary>
    public double StoreWaitMinutes { get; init; } = 10;

    /// <summary>Which models fail: no failure rate or rise is given for a group of fewer devices (lab policy: 5).</summary>
    public int FleetMinimumDevices { get; init; } = 5;

    /// <summary>Which models fail: the as-found tests counted lie within this many years before the day judged (lab policy: 5).</summary>
    public double FleetWindowYears { get; init; } = 5;

    /// <summary>Months from the latest as-found test to the next, by grade (lab policy); for <see cref="ConditionGrade.Untested"/>, from commissioning.</summary>
    public IReadOnlyDictionary<ConditionGrade, int> DueMonths { get; init; } = new Dictionary<ConditionGrade, int>
    {
        [ConditionGrade.Sound] = 36,
        [ConditionGrade.Watch] = 24,
        [ConditionGrade.PlanWork] = 12,

        // A device never tested is due this many months after its commissioning: an as-found (acceptance) test at
        // commissioning is common practice, no source.
        [ConditionGrade.Untested] = 0,
        [ConditionGrade.Repair] = 3,
        [ConditionGrade.TakeOutOfService] = 0,
    };

    /// <summary>Per-family overrides of <see cref="DueMonths"/>.</summary>
    public IReadOnlyDictionary<(DeviceFamily Family, ConditionGrade Grade), int> FamilyDueMonths { get; init; } =
        new Dictionary<(DeviceFamily, ConditionGrade), int>();

    /// <summary>The months between tests for a device of <paramref name="family"/> in <paramref name="grade"/>.</summary>
    public int MonthsBetweenTests(DeviceFamily family, ConditionGrade grade) =>
        FamilyDueMonths.TryGetValue((family, grade), out var months) ? months : DueMonths[grade];
}
