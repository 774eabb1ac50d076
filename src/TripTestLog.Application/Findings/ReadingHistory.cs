using TripTestLog.Application.Check;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>A pole's contact resistance at one test, as the findings judge it: the median of its readings, referred to 20 °C.</summary>
/// <param name="Pole">The pole.</param>
/// <param name="Date">The test date.</param>
/// <param name="Stage">As-found or as-left.</param>
/// <param name="CorrectedMicroOhms">The median referred to 20 °C (as measured when no temperature was recorded).</param>
/// <param name="MeasuredMicroOhms">The median as measured.</param>
/// <param name="TemperatureKnown">Whether every reading had a temperature.</param>
/// <param name="TestCurrentAmperes">The lowest test current used.</param>
/// <param name="Readings">How many readings the median rests on.</param>
public sealed record PoleReading(string Pole, DateOnly Date, TestStage Stage, double CorrectedMicroOhms, double MeasuredMicroOhms,
    bool TemperatureKnown, double TestCurrentAmperes, int Readings);

/// <summary>A path's insulation reading, referred to 20 °C by the halving-per-10-K rule.</summary>
/// <param name="Path">The path.</param>
/// <param name="Date">The test date.</param>
/// <param name="Stage">As-found or as-left.</param>
/// <param name="CorrectedMegaOhms">Referred to 20 °C (as measured when no temperature was recorded).</param>
/// <param name="MeasuredMegaOhms">As measured.</param>
/// <param name="OverRange">Whether the instrument read over its range.</param>
/// <param name="TestVoltageVolts">The DC test voltage.</param>
public sealed record PathReading(string Path, DateOnly Date, TestStage Stage, double CorrectedMegaOhms, double MeasuredMegaOhms, bool OverRange,
    double TestVoltageVolts);

/// <summary>A device's contact and insulation readings as the findings see them, for reports and charts.</summary>
public static class ReadingHistory
{
    /// <summary>Each pole at each test, in time order.</summary>
    public static IEnumerable<PoleReading> Contacts(IReadOnlyList<StoredMeasurement<ContactMeasurement>> readings) =>
        ContactRules.Sessions(readings).SelectMany(s => s).Select(p => new PoleReading(p.Pole, p.At.Date, p.Stage, p.Corrected, p.Measured,
            p.TemperatureKnown, p.TestCurrent, p.Sources.Count));

    /// <summary>Each path at each test, in time order.</summary>
    public static IEnumerable<PathReading> Insulation(IReadOnlyList<StoredMeasurement<InsulationMeasurement>> readings) =>
        InsulationRules.Results(readings).Select(r => new PathReading(r.Path, r.At.Date, r.Stage, r.Corrected, r.Measured, r.OverRange, r.TestVoltage));
}
