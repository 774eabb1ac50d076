using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Condition;

/// <summary>
/// Refers a contact resistance read at some temperature to 20 °C, as copper's resistance rises with temperature:
/// R20 = R / (1 + α20 × (T − 20)), with α20 = 0.00393 per kelvin for annealed copper (IEC 60228, the temperature
/// correction for conductor resistance; the same coefficient as its factor 254.5 / (234.5 + T), from memory).
/// </summary>
public static class CopperCorrection
{
    /// <summary>Copper's temperature coefficient of resistance at 20 °C, per kelvin (IEC 60228).</summary>
    public const double Alpha20 = 0.00393;

    /// <summary>The reference temperature: 20 °C.</summary>
    public const double ReferenceCelsius = 20.0;

    /// <summary>The resistance <paramref name="measured"/> at <paramref name="temperature"/> would read at 20 °C.</summary>
    public static MicroOhms ToTwentyCelsius(MicroOhms measured, Celsius temperature) =>
        MicroOhms.Of(measured.Value / (1 + Alpha20 * (temperature.Value - ReferenceCelsius)));
}
