using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Measurements;

/// <summary>One contact (micro-ohm) resistance reading across a closed pole, taken with a DC test current.</summary>
/// <param name="Tag">The device tested.</param>
/// <param name="TestedAt">When.</param>
/// <param name="Stage">As-found or as-left.</param>
/// <param name="Pole">Pole measured.</param>
/// <param name="Resistance">The reading.</param>
/// <param name="TestCurrent">The DC test current.</param>
/// <param name="Temperature">Device or ambient temperature, when recorded.</param>
/// <param name="Instrument">Ohmmeter identity.</param>
/// <param name="Technician">Who made the test.</param>
public sealed record ContactMeasurement(
    AssetTag Tag,
    TestedAt TestedAt,
    TestStage Stage,
    Pole Pole,
    MicroOhms Resistance,
    Amperes TestCurrent,
    Celsius? Temperature,
    string Instrument,
    string Technician) : IMeasurement;
