using TripTestLog.Domain.Codes;
using System.Globalization;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Cli.Output;

/// <summary>How values are written for people: fixed, culture-invariant forms.</summary>
internal static class Format
{
    public static string Number(double value, string format = "0.###") => value.ToString(format, CultureInfo.InvariantCulture);

    /// <summary>
    /// A measured value as it was read: rounded to nine decimal places, finer than any record file carries, which drops
    /// the noise a unit conversion leaves (9.8 ms is 0.0098 s, not 0.009800000000000001). Arithmetic, no text round
    /// trip: this runs for every number of every verdict written.
    /// </summary>
    public static double Measured(double value) => double.IsFinite(value) && Math.Abs(value) < 1e6 ? Math.Round(value, 9) : value;

    /// <summary>A computed value rounded to <paramref name="digits"/> significant digits.</summary>
    public static double Significant(double value, int digits)
    {
        if (value == 0 || !double.IsFinite(value))
        {
            return value;
        }

        var decimals = digits - 1 - (int)Math.Floor(Math.Log10(Math.Abs(value)));
        if (decimals >= 0)
        {
            return Math.Round(value, Math.Min(decimals, 15));
        }

        var scale = Math.Pow(10, -decimals);
        return Math.Round(value / scale) * scale;
    }

    /// <summary>A computed band edge: six significant digits.</summary>
    public static double? Edge(double? seconds) => seconds is { } s ? Significant(s, 6) : null;

    /// <summary>A minimum edge: "0" where the release may act at once, "never" where it must not act at all.</summary>
    public static string Minimum(BandEdge edge) => edge.Limit is { } s ? (edge.IsOpen ? "0" : s.ToString()) : "never";

    /// <summary>A maximum edge: "none" where no trip is required.</summary>
    public static string Maximum(BandEdge edge) => edge.Limit is { } s ? s.ToString() : "none";

    public static string Outcome(TripOutcome outcome) => outcome.Tripped ? $"tripped {outcome.Time}" : $"held {outcome.Time}";

    public static string Stage(TestStage stage) => TextCodes.Stage.Of(stage);

    public static string Start(StartCondition start) => TextCodes.Start.Of(start);

    public static string Verdict(Verdict verdict) => TextCodes.Verdict.Of(verdict);

    public static string Basis(VerdictBasis basis) => basis == VerdictBasis.Normative ? "normative" : "band";

    public static string Source(EdgeSource source) => source switch
    {
        EdgeSource.NormativePoint => "normative",
        EdgeSource.Interpolated => "interpolated",
        EdgeSource.Extrapolated => "extrapolated",
        EdgeSource.Instantaneous => "instantaneous",
        EdgeSource.Characteristic => "characteristic",
        EdgeSource.Setting => "setting",
        EdgeSource.CurveTable => "curve-table",
        EdgeSource.Derived => "derived",
        _ => "none",
    };

    /// <summary>The test current as a multiple of the envelope's reference, e.g. "2.56 In" or "6.02 Ir".</summary>
    public static string Multiple(Application.Check.JudgedTrip r) =>
        $"{Number(r.Trip.Measurement.Current.Value / r.Envelope.Reference.Value, "0.00")} {r.Envelope.ReferenceName}";
}
