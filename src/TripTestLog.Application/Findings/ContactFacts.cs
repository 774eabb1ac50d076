using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>What the contact resistance rules find, as values. Resistances are in micro-ohms.</summary>
public static class ContactFacts
{
    /// <summary>A pole's reading: referred to 20 °C where its temperature is known, and as measured.</summary>
    /// <param name="Corrected">At 20 °C (as measured where no temperature is known), µΩ.</param>
    /// <param name="Measured">As measured, µΩ.</param>
    /// <param name="TemperatureKnown">Whether a temperature was recorded, so the reading was referred to 20 °C.</param>
    public sealed record PoleReading(double Corrected, double Measured, bool TemperatureKnown);

    /// <summary>A reading within the guard band of the maker's limit under the guarded or non-binary rule.</summary>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Pole">The pole.</param>
    /// <param name="Corrected">Its reading at 20 °C, µΩ.</param>
    /// <param name="Limit">The maker's limit, µΩ.</param>
    /// <param name="Guard">The guard band, µΩ.</param>
    /// <param name="Expanded">The expanded uncertainty U, µΩ.</param>
    /// <param name="Accuracy">The instrument's accuracy the uncertainty comes from.</param>
    /// <param name="Rule">The policy's decision rule.</param>
    public sealed record WithinUncertainty(TestStage Stage, string Pole, double Corrected, double Limit, double Guard, double Expanded, ResolvedAccuracy Accuracy,
        DecisionRule Rule) : FindingFacts;

    /// <summary>contact-over-limit: a pole over the maker's limit.</summary>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Pole">The pole.</param>
    /// <param name="Reading">Its reading.</param>
    /// <param name="Limit">The maker's limit, µΩ.</param>
    public sealed record OverLimit(TestStage Stage, string Pole, PoleReading Reading, double Limit) : FindingFacts;

    /// <summary>contact-pole-spread: a pole more than the policy's threshold above the device's lowest pole.</summary>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Pole">The pole.</param>
    /// <param name="AbovePercent">How far above the lowest, per cent.</param>
    /// <param name="Corrected">Its reading at 20 °C, µΩ.</param>
    /// <param name="Lowest">The lowest pole's reading at 20 °C, µΩ.</param>
    /// <param name="ThresholdPercent">The policy's <c>contact_spread_percent</c>.</param>
    /// <param name="Basis">Whether the threshold is the customary guide's or the lab's own.</param>
    public sealed record PoleSpread(TestStage Stage, string Pole, double AbovePercent, double Corrected, double Lowest, double ThresholdPercent, SpreadBasis Basis) : FindingFacts;

    /// <summary>contact-rise: a pole risen more than the policy allows over its first as-found test.</summary>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Pole">The pole.</param>
    /// <param name="RisePercent">The rise, per cent.</param>
    /// <param name="Since">The date of the first as-found test.</param>
    /// <param name="From">The first reading at 20 °C, µΩ.</param>
    /// <param name="To">The latest reading at 20 °C, µΩ.</param>
    public sealed record Rise(TestStage Stage, string Pole, double RisePercent, DateOnly Since, double From, double To) : FindingFacts;

    /// <summary>contact-low-test-current: a test at less current than usual for the rating.</summary>
    /// <param name="Amperes">The lowest test current, A DC.</param>
    /// <param name="Usual">The usual current for the rating (lab policy), A DC.</param>
    /// <param name="Rated">The breaker's rated current, A.</param>
    public sealed record LowTestCurrent(double Amperes, double Usual, double Rated) : FindingFacts;

    /// <summary>contact-trend-limit: a pole's readings rising towards the maker's limit.</summary>
    /// <param name="Pole">The pole.</param>
    /// <param name="Tests">How many tests the line rests on.</param>
    /// <param name="SlopePerYear">The line's rise, µΩ a year.</param>
    /// <param name="Limit">The maker's limit, µΩ.</param>
    /// <param name="Dates">The forecast date, the due date and the day judged on.</param>
    /// <param name="Scattered">Whether the readings scatter too much for the date to be trusted.</param>
    /// <param name="Untraceable">Untraceable readings in or left out of the line.</param>
    public sealed record TrendLimit(string Pole, int Tests, double SlopePerYear, double Limit, ForecastDates Dates, bool Scattered,
        UntraceableShare Untraceable) : FindingFacts;
}

/// <summary>Which basis a pole-spread threshold rests on.</summary>
public enum SpreadBasis
{
    /// <summary>The ANSI/NETA maintenance testing specifications' customary guide (the policy keeps its number).</summary>
    CustomaryGuide,

    /// <summary>The lab's own threshold, set in its policy.</summary>
    LabPolicy,
}
