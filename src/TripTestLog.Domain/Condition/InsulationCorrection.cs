using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Condition;

/// <summary>
/// Refers an insulation resistance to 20 °C with the rule of thumb that it halves for every 10 K rise (so doubles for
/// every 10 K fall): R20 = R × 2^((T − 20) / 10). Common practice, not a standard's requirement: the halving-per-10-K
/// approximation is the one maintenance guides quote for solid insulation (from memory). Applied before trending, so a
/// cold day's high reading does not hide a fall.
/// </summary>
public static class InsulationCorrection
{
    /// <summary>The temperature rise that halves insulation resistance under the rule: 10 K.</summary>
    public const double HalvingKelvin = 10.0;

    /// <summary>The reference temperature: 20 °C.</summary>
    public const double ReferenceCelsius = 20.0;

    /// <summary>The resistance <paramref name="measured"/> at <paramref name="temperature"/> would read at 20 °C.</summary>
    public static MegaOhms ToTwentyCelsius(MegaOhms measured, Celsius temperature) =>
        MegaOhms.Of(measured.Value * Math.Pow(2, (temperature.Value - ReferenceCelsius) / HalvingKelvin));
}
