using System.Globalization;

namespace TripTestLog.Domain.Quantities;

/// <summary>
/// Resistances as a person reads them, one way everywhere: micro-ohms as µΩ and megohms as MΩ (machine fields keep their
/// ASCII names, _uohm and _mohm). Insulation readings show three significant figures, about what an insulation tester
/// resolves, so an over-range 2297.4 MΩ reads "2300 MΩ"; contact readings show tenths of a micro-ohm below 1000 µΩ
/// and whole micro-ohms above, as a micro-ohm meter's display does.
/// </summary>
public static class ResistanceText
{
    /// <summary>The micro-ohm sign as printed.</summary>
    public const string MicroOhmUnit = "µΩ";

    /// <summary>The megohm sign as printed.</summary>
    public const string MegaOhmUnit = "MΩ";

    /// <summary>A contact resistance, e.g. "15158 µΩ", "99.6 µΩ", "8.42 µΩ".</summary>
    public static string MicroOhms(double microOhms) =>
        (Math.Abs(microOhms) >= 1000 ? Number(microOhms, 0) : Math.Abs(microOhms) >= 10 ? Trimmed(microOhms, "0.#") : Trimmed(microOhms, "0.##"))
        + " " + MicroOhmUnit;

    private static string Trimmed(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

    /// <summary>An insulation resistance to three significant figures, e.g. "2300 MΩ", "997 MΩ", "0.512 MΩ".</summary>
    public static string MegaOhms(double megaOhms) => Number(megaOhms, null) + " " + MegaOhmUnit;

    /// <summary>
    /// <paramref name="value"/> with <paramref name="decimals"/> places, or (null) rounded to three significant figures
    /// without trailing zeros after the point.
    /// </summary>
    public static string Number(double value, int? decimals)
    {
        if (decimals is { } d)
        {
            return Math.Round(value, d, MidpointRounding.AwayFromZero).ToString("F" + d, CultureInfo.InvariantCulture);
        }

        if (value == 0 || !double.IsFinite(value))
        {
            return value.ToString(CultureInfo.InvariantCulture);
        }

        var magnitude = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        var places = 2 - magnitude;
        if (places >= 0)
        {
            return Math.Round(value, places, MidpointRounding.AwayFromZero).ToString("0." + new string('#', places), CultureInfo.InvariantCulture);
        }

        var scale = Math.Pow(10, -places);
        return (Math.Round(value / scale, MidpointRounding.AwayFromZero) * scale).ToString("0", CultureInfo.InvariantCulture);
    }
}
