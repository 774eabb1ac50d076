using System.Globalization;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>
/// A trip test point of one device, so tests made at it over the years can be compared: the nominal multiple (the
/// standard's point the test was aimed at, else the measured multiple on a 5 % grid), the start, and the pole when
/// one pole was loaded.
/// </summary>
/// <param name="Key">Identity for grouping.</param>
/// <param name="Label">In words, e.g. "2.55 In cold" or "5 In cold, pole 2".</param>
public readonly record struct TripPoint(string Key, string Label)
{
    // Aimed at a standard's point when within 10 % of its multiple (test sets land a few per cent off the set point).
    private const double PointWindow = 0.10;
    private const double Grid = 1.05;

    /// <summary>The point <paramref name="judged"/> was made at.</summary>
    public static TripPoint Of(JudgedTrip judged)
    {
        var a = judged.Assessment;
        var multiple = a.Band.Multiple.Value;
        var nominal = a.Point is { } p && Math.Abs(multiple / p.Multiple.Value - 1) <= PointWindow
            ? p.Multiple.Value
            : Math.Round(Math.Pow(Grid, Math.Round(Math.Log(multiple) / Math.Log(Grid))), 2);
        var m = judged.Trip.Measurement;
        var start = TextCodes.Start.Of(m.Start);
        var pole = a.Band.Conditions.Loading == PoleLoading.OnePole ? $", pole {m.Pole}" : "";
        var text = nominal.ToString("0.##", CultureInfo.InvariantCulture);
        return new TripPoint($"{text}|{start}|{pole}", $"{text} {judged.Envelope.ReferenceName} {start}{pole}");
    }
}
