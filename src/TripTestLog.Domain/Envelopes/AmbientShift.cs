using System.Globalization;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The range of current factors an ambient away from a thermal release's reference may act as: warmer, the release
/// acts as at reference with up to <see cref="Upper"/> times the current; colder, with as little as <see cref="Lower"/>
/// times it. Limits move only in the test's favour, so one side is always 1.
/// </summary>
/// <param name="Lower">At most 1: the factor on the current for a trip-by limit.</param>
/// <param name="Upper">At least 1: the factor on the current for a no-trip limit.</param>
/// <param name="Words">The shift in words for reasons, e.g. "21 °C, 9 K below the 30 °C reference, up to 1 % of current per K".</param>
public readonly record struct AmbientShift(double Lower, double Upper, string Words)
{
    /// <summary>No shift.</summary>
    public static AmbientShift None => new(1.0, 1.0, "");

    /// <summary>Whether the shift moves nothing.</summary>
    public bool IsNone => Lower == 1.0 && Upper == 1.0;

    /// <summary>The shift for <paramref name="deltaKelvin"/> (ambient less reference) at up to <paramref name="perKelvin"/> of current per kelvin.</summary>
    public static AmbientShift For(double deltaKelvin, double perKelvin, string ambient, string reference)
    {
        var pct = (perKelvin * 100).ToString("0.#", CultureInfo.InvariantCulture);
        var words = $"{ambient}, {Math.Abs(deltaKelvin).ToString("0.#", CultureInfo.InvariantCulture)} K {(deltaKelvin < 0 ? "below" : "above")} the {reference} reference, up to {pct} % of current per K";
        var shift = Math.Min(0.5, perKelvin * Math.Abs(deltaKelvin));
        return deltaKelvin < 0 ? new AmbientShift(1 - shift, 1.0, words) : new AmbientShift(1.0, 1 + shift, words);
    }
}
