using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Measurements;

/// <summary>One primary-injection trip test as recorded by the test set.</summary>
/// <param name="Tag">The device tested.</param>
/// <param name="TestedAt">When.</param>
/// <param name="Stage">As-found or as-left.</param>
/// <param name="Pole">Pole injected, or all poles together.</param>
/// <param name="Current">The measured test current (never the nominal set point).</param>
/// <param name="Outcome">Tripped after a time, or held for a time.</param>
/// <param name="Start">Cold or warm start.</param>
/// <param name="Ambient">Ambient temperature during the test, when recorded.</param>
/// <param name="Instrument">Test set identity.</param>
/// <param name="Technician">Who made the test.</param>
/// <param name="Note">Free text.</param>
public sealed record TripMeasurement(
    AssetTag Tag,
    TestedAt TestedAt,
    TestStage Stage,
    Pole Pole,
    Amperes Current,
    TripOutcome Outcome,
    StartCondition Start,
    Celsius? Ambient,
    string Instrument,
    string Technician,
    string Note) : IMeasurement
{
    /// <summary>Settings read off the device at this test, when the record carries them.</summary>
    public SettingsFound? FoundSettings { get; init; }
}
