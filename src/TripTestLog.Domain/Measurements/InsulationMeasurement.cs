using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Measurements;

/// <summary>One insulation resistance test on one path (pole to earth, pole to pole, or across the open contacts).</summary>
/// <param name="Tag">The device tested.</param>
/// <param name="TestedAt">When.</param>
/// <param name="Stage">As-found or as-left.</param>
/// <param name="Path">The path measured, e.g. 1-E, 1-2, or 1-1' across the open contacts of pole 1.</param>
/// <param name="TestVoltage">The DC test voltage.</param>
/// <param name="Resistance">The reading.</param>
/// <param name="Temperature">Temperature, when recorded.</param>
/// <param name="Duration">How long the voltage was applied before reading, when recorded.</param>
public sealed record InsulationMeasurement(
    AssetTag Tag,
    TestedAt TestedAt,
    TestStage Stage,
    string Path,
    Volts TestVoltage,
    InsulationReading Resistance,
    Celsius? Temperature,
    Seconds? Duration) : IMeasurement
{
    /// <summary>The insulation tester's identity; empty when the record does not name one.</summary>
    public string Instrument { get; init; } = "";
}
