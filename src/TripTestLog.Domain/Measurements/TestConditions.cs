namespace TripTestLog.Domain.Measurements;

/// <summary>
/// The conditions a trip test ran under that decide which requirements it can speak to: the thermal start and the poles
/// loaded. A warm release trips sooner than a cold one, and a multipole thermal release loaded on one pole trips later
/// than with every pole loaded, so each condition orders tests from "cooler" to "hotter".
/// </summary>
/// <param name="Start">Cold or warm start.</param>
/// <param name="Loading">All poles or one pole loaded.</param>
public readonly record struct TestConditions(StartCondition Start, PoleLoading Loading)
{
    /// <summary>From cold, every pole loaded: the reference conditions of the standards' time-current tests.</summary>
    public static TestConditions Reference => new(StartCondition.Cold, PoleLoading.AllPoles);

    /// <summary>The conditions of a recorded test on a device with <paramref name="poles"/> protected poles.</summary>
    public static TestConditions Of(TripMeasurement measurement, int poles)
    {
        ArgumentNullException.ThrowIfNull(measurement);
        var onePole = poles > 1 && measurement.Pole != Pole.All;
        return new TestConditions(measurement.Start, onePole ? PoleLoading.OnePole : PoleLoading.AllPoles);
    }

    /// <summary>In words, e.g. "from cold, all poles loaded".</summary>
    public override string ToString() =>
        $"{(Start == StartCondition.Cold ? "from cold" : "from warm")}, {(Loading == PoleLoading.AllPoles ? "all poles loaded" : "one pole loaded")}";
}
