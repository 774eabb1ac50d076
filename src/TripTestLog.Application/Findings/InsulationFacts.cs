using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>What the insulation resistance rules find, as values. Resistances are in megohms, voltages in volts.</summary>
public static class InsulationFacts
{
    /// <summary>A path's reading: referred to 20 °C by the policy's rule where its temperature is known, and as measured.</summary>
    /// <param name="Corrected">At 20 °C by <paramref name="Rule"/> (as measured where no temperature is known), MΩ.</param>
    /// <param name="Measured">As measured, MΩ.</param>
    /// <param name="Celsius">The temperature recorded, °C, if any.</param>
    /// <param name="Rule">The policy's <c>insulation_correction</c>.</param>
    public sealed record PathReading(double Corrected, double Measured, double? Celsius, InsulationCorrectionRule Rule);

    /// <summary>A reading within the guard band of the minimum under the guarded or non-binary rule.</summary>
    /// <param name="Path">The path.</param>
    /// <param name="Corrected">Its reading at 20 °C, MΩ.</param>
    /// <param name="Minimum">The table's minimum, MΩ.</param>
    /// <param name="Guard">The guard band, MΩ.</param>
    /// <param name="Expanded">The expanded uncertainty U, MΩ.</param>
    /// <param name="Accuracy">The instrument's accuracy the uncertainty comes from.</param>
    /// <param name="Rule">The policy's decision rule.</param>
    public sealed record WithinUncertainty(string Path, double Corrected, double Minimum, double Guard, double Expanded, ResolvedAccuracy Accuracy,
        DecisionRule Rule) : FindingFacts;

    /// <summary>insulation-below-minimum: a path below the table's minimum.</summary>
    /// <param name="Requirement">The table row's source.</param>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Path">The path.</param>
    /// <param name="Reading">Its reading.</param>
    /// <param name="Minimum">The table's minimum, MΩ.</param>
    /// <param name="RatedVolts">The breaker's rated voltage.</param>
    /// <param name="TestVolts">The test voltage, DC.</param>
    /// <param name="TableVolts">The test voltage the table's minimum assumes, DC.</param>
    public sealed record BelowMinimum(string Requirement, TestStage Stage, string Path, PathReading Reading, double Minimum, double RatedVolts,
        double TestVolts, double TableVolts) : FindingFacts;

    /// <summary>insulation-test-voltage: a path tested at less than the table's voltage.</summary>
    /// <param name="Requirement">The table row's source.</param>
    /// <param name="Stage">The test's stage.</param>
    /// <param name="Path">The path.</param>
    /// <param name="Reading">Its reading.</param>
    /// <param name="RatedVolts">The breaker's rated voltage.</param>
    /// <param name="TestVolts">The test voltage, DC.</param>
    /// <param name="TableVolts">The test voltage the table asks, DC.</param>
    public sealed record TestVoltage(string Requirement, TestStage Stage, string Path, PathReading Reading, double RatedVolts, double TestVolts,
        double TableVolts) : FindingFacts;

    /// <summary>insulation-falling: a path's readings falling faster than the policy allows.</summary>
    /// <param name="Path">The path.</param>
    /// <param name="Readings">How many readings the line rests on.</param>
    /// <param name="Rule">The policy's <c>insulation_correction</c>.</param>
    /// <param name="FallPercentPerYear">The fall, per cent a year.</param>
    /// <param name="First">The first reading at 20 °C, MΩ.</param>
    /// <param name="FirstOn">Its date.</param>
    /// <param name="Last">The latest reading at 20 °C, MΩ.</param>
    /// <param name="Minimum">The table's minimum, MΩ, where the line reaches it within the horizon.</param>
    /// <param name="ReachesOn">The date the line reaches the minimum, within the horizon.</param>
    /// <param name="AsOf">The day judged on.</param>
    /// <param name="Untraceable">Untraceable readings in or left out of the line.</param>
    public sealed record Falling(string Path, int Readings, InsulationCorrectionRule Rule, double FallPercentPerYear, double First, DateOnly FirstOn,
        double Last, double? Minimum, DateOnly? ReachesOn, DateOnly AsOf, UntraceableShare Untraceable) : FindingFacts;
}
