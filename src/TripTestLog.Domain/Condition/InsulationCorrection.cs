using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Condition;

/// <summary>
/// Refers an insulation resistance to 20 °C by the lab's chosen rule, applied before trending so a cold day's high
/// reading does not hide a fall. Each rule is an exponential in the temperature, R20 = R × base^((T − 20) / step):
/// <list type="bullet">
/// <item><see cref="InsulationCorrectionRule.HalvingPer10K"/>: halves for every 10 K rise, × 4 at 40 °C. Common practice,
/// no standard's requirement; it follows the oil-filled columns of the conversion tables in maintenance use (from memory).</item>
/// <item><see cref="InsulationCorrectionRule.SolidInsulation"/>: tenfold for every 50 K rise (about halving per 15 K),
/// × 2.51 at 40 °C; the solid-insulation columns of those tables read × 1.25 at 25 °C, × 2.50 at 40 °C and × 10 at
/// 70 °C (from memory), which this rule matches to within 1 %.</item>
/// <item><see cref="InsulationCorrectionRule.None"/>: no correction; the lab compares readings taken at like temperatures.</item>
/// </list>
/// </summary>
public static class InsulationCorrection
{
    /// <summary>The reference temperature: 20 °C.</summary>
    public const double ReferenceCelsius = 20.0;

    /// <summary>The resistance <paramref name="measured"/> at <paramref name="temperature"/> would read at 20 °C under <paramref name="rule"/>.</summary>
    public static MegaOhms ToTwentyCelsius(MegaOhms measured, Celsius temperature, InsulationCorrectionRule rule) =>
        MegaOhms.Of(measured.Value * FactorAt(temperature, rule));

    /// <summary>The factor that refers a reading at <paramref name="temperature"/> to 20 °C under <paramref name="rule"/>.</summary>
    public static double FactorAt(Celsius temperature, InsulationCorrectionRule rule)
    {
        var rise = temperature.Value - ReferenceCelsius;
        return rule switch
        {
            InsulationCorrectionRule.HalvingPer10K => Math.Pow(2, rise / 10),
            InsulationCorrectionRule.SolidInsulation => Math.Pow(10, rise / 50),
            _ => 1,
        };
    }
}

/// <summary>How a lab refers insulation readings to 20 °C; the text codes are in the lab policy.</summary>
public enum InsulationCorrectionRule
{
    /// <summary>Halves for every 10 K rise (the default).</summary>
    HalvingPer10K,

    /// <summary>Tenfold for every 50 K rise: milder when hot, as solid insulation behaves.</summary>
    SolidInsulation,

    /// <summary>No correction.</summary>
    None,
}
