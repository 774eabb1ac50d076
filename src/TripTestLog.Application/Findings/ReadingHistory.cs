using TripTestLog.Application.Check;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Instruments;
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
/// <param name="Traceable">Whether its instrument was traceable on the day (in calibration, and registered where the lab requires it).</param>
public sealed record PoleReading(string Pole, DateOnly Date, TestStage Stage, double CorrectedMicroOhms, double MeasuredMicroOhms,
    bool TemperatureKnown, double TestCurrentAmperes, int Readings, bool Traceable);

/// <summary>A path's insulation reading, referred to 20 °C by the lab policy's rule.</summary>
/// <param name="Path">The path.</param>
/// <param name="Date">The test date.</param>
/// <param name="Stage">As-found or as-left.</param>
/// <param name="CorrectedMegaOhms">Referred to 20 °C (as measured when no temperature was recorded).</param>
/// <param name="MeasuredMegaOhms">As measured.</param>
/// <param name="OverRange">Whether the instrument read over its range.</param>
/// <param name="TestVoltageVolts">The DC test voltage.</param>
/// <param name="Celsius">The temperature recorded, if any.</param>
/// <param name="Traceable">Whether its instrument was traceable on the day.</param>
public sealed record PathReading(string Path, DateOnly Date, TestStage Stage, double CorrectedMegaOhms, double MeasuredMegaOhms, bool OverRange,
    double TestVoltageVolts, double? Celsius, bool Traceable);

/// <summary>A device's contact and insulation readings as the findings see them, for reports and charts.</summary>
public static class ReadingHistory
{
    /// <summary>Each pole at each test, in time order, with whether its instrument was traceable under <paramref name="policy"/>.</summary>
    public static IEnumerable<PoleReading> Contacts(IReadOnlyList<StoredMeasurement<ContactMeasurement>> readings, FindingPolicy policy,
        InstrumentRegister instruments) =>
        ContactRules.Sessions(readings).SelectMany(s => s).Select(p => new PoleReading(p.Pole, p.At.Date, p.Stage, p.Corrected, p.Measured,
            p.TemperatureKnown, p.TestCurrent, p.Sources.Count, ContactRules.Traceable(p, instruments, policy)));

    /// <summary>Each path at each test, in time order, referred to 20 °C by <paramref name="policy"/>'s rule.</summary>
    public static IEnumerable<PathReading> Insulation(IReadOnlyList<StoredMeasurement<InsulationMeasurement>> readings, FindingPolicy policy,
        InstrumentRegister instruments) =>
        InsulationRules.Results(readings, policy, instruments).Select(r => new PathReading(r.Path, r.At.Date, r.Stage, r.Corrected, r.Measured,
            r.OverRange, r.TestVoltage, r.Celsius, r.Traceable));

    /// <summary>Whether a trip test's instrument was traceable on the day (the judge raised no instrument finding on it).</summary>
    public static bool Traceable(JudgedTrip trip) => TripRules.Traceable(trip);

    /// <summary>The correction rule in words, for a page: "insulation_correction = halving-10k (halves per 10 K rise)".</summary>
    public static string InsulationCorrectionWords(FindingPolicy policy) => InsulationRules.Setting(policy) + policy.InsulationCorrection switch
    {
        InsulationCorrectionRule.HalvingPer10K => ": halves for every 10 K rise, R20 = R × 2^((T − 20) / 10); common practice",
        InsulationCorrectionRule.SolidInsulation => ": tenfold for every 50 K rise, R20 = R × 10^((T − 20) / 50), × 2.5 at 40 °C",
        _ => ": not corrected; readings are compared as measured",
    };
}
