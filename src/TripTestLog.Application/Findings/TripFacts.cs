using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>What the trip rules find, as values.</summary>
public static class TripFacts
{
    /// <summary>A test's verdict out of band, as the check reports it.</summary>
    /// <param name="Requirement">The edge's requirement (standard and clause, or the settings).</param>
    /// <param name="Reason">The verdict's reason, as the judge gives it.</param>
    public sealed record OutOfBand(string Requirement, string Reason) : FindingFacts;

    /// <summary>A verdict out of band at a test point, as the findings report it.</summary>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Point">The test point, e.g. "2.55 In cold".</param>
    /// <param name="Requirement">The edge's requirement.</param>
    /// <param name="Reason">The verdict's reason, as the judge gives it.</param>
    public sealed record OutOfBandAt(TestStage Stage, string Point, string Requirement, string Reason) : FindingFacts;

    /// <summary>A result within the measurement uncertainty of its limit under the guarded or non-binary rule.</summary>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Point">The test point.</param>
    /// <param name="Rule">The policy's decision rule.</param>
    /// <param name="Conformity">The conformity statement under the non-binary rule, if any.</param>
    /// <param name="Reason">The verdict's reason, as the judge gives it.</param>
    public sealed record WithinUncertainty(TestStage Stage, string Point, DecisionRule Rule, Conformity? Conformity, string Reason) : FindingFacts;

    /// <summary>A verdict that neither broke nor proved a requirement.</summary>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Point">The test point.</param>
    /// <param name="Reason">The verdict's reason, as the judge gives it.</param>
    public sealed record NotAssessable(TestStage Stage, string Point, string Reason) : FindingFacts;

    /// <summary>Settings found on the device that differ from the register's.</summary>
    /// <param name="Differences">Each difference, as the settings give it.</param>
    public sealed record SettingsDiffer(IReadOnlyList<string> Differences) : FindingFacts;

    /// <summary>
    /// trip-drift: the latest as-found time at a point against the first at its present settings. The test that fired
    /// is <paramref name="ByTime"/> (the factor between the two times) or else the move of the place in the band.
    /// </summary>
    /// <param name="Point">The test point.</param>
    /// <param name="First">The first as-found time.</param>
    /// <param name="FirstOn">Its date.</param>
    /// <param name="Last">The latest as-found time.</param>
    /// <param name="LastOn">Its date.</param>
    /// <param name="SettingsChangedOn">The date the settings last changed, where the tests start after one.</param>
    /// <param name="ByTime">Whether the time factor fired (else the band move).</param>
    /// <param name="Slower">Whether the latest is the slower of the two.</param>
    /// <param name="Factor">The slower time over the faster.</param>
    /// <param name="TimeLimitPercent">The policy's <c>trip_drift_time_percent</c>.</param>
    /// <param name="Shift">The move of the place in the band, as a fraction of the band.</param>
    /// <param name="FromPlace">The first test's place in the band (0 earliest allowed, 1 latest).</param>
    /// <param name="ToPlace">The latest test's place in the band.</param>
    /// <param name="BandLimitPercent">The policy's <c>trip_drift_band_percent</c>.</param>
    public sealed record Drift(string Point, Seconds First, DateOnly FirstOn, Seconds Last, DateOnly LastOn, DateOnly? SettingsChangedOn,
        bool ByTime, bool Slower, double Factor, double TimeLimitPercent, double Shift, double FromPlace, double ToPlace, double BandLimitPercent) : FindingFacts;

    /// <summary>trip-trend-exit: a trend of as-found times reaching a guaranteed edge.</summary>
    /// <param name="Point">The test point.</param>
    /// <param name="Tests">How many tests the line rests on.</param>
    /// <param name="Requirement">The edge's requirement.</param>
    /// <param name="TowardsLatest">Whether the times rise towards the latest allowed time (else fall towards the earliest).</param>
    /// <param name="Edge">The edge's time.</param>
    /// <param name="Dates">The forecast date, the due date and the day judged on.</param>
    /// <param name="Scattered">Whether the tests scatter too much for the date to be trusted.</param>
    /// <param name="Untraceable">Untraceable readings in or left out of the line.</param>
    public sealed record TrendExit(string Point, int Tests, string Requirement, bool TowardsLatest, Seconds Edge, ForecastDates Dates, bool Scattered,
        UntraceableShare Untraceable) : FindingFacts;

    /// <summary>peer-outlier: a latest as-found result far from its peers'.</summary>
    /// <param name="Point">The test point.</param>
    /// <param name="Slower">Whether it trips slower than its peers (else faster).</param>
    /// <param name="Peers">How many peers, the device aside.</param>
    /// <param name="Group">The peer group's name: family, settings and rating.</param>
    /// <param name="Place">Its place in the band (0 earliest allowed, 1 latest).</param>
    /// <param name="Median">The group's median place.</param>
    public sealed record PeerOutlier(string Point, bool Slower, int Peers, string Group, double Place, double Median) : FindingFacts;
}
