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

    /// <summary>An edge's time; "0" for a minimum that sets no limit, "none" for an unbounded maximum.</summary>
    public static string Edge(BandEdge edge) => edge.Limit is { } s ? (edge.IsOpen ? "0" : s.ToString()) : "none";

    public static string Outcome(TripOutcome outcome) => outcome.Tripped ? $"tripped {outcome.Time}" : $"held {outcome.Time}";

    public static string Stage(TestStage stage) => stage == TestStage.AsFound ? "as-found" : "as-left";

    public static string Start(StartCondition start) => start == StartCondition.Cold ? "cold" : "warm";

    public static string Verdict(Verdict verdict) => verdict switch
    {
        Domain.Verdicts.Verdict.Pass => "pass",
        Domain.Verdicts.Verdict.TooEarly => "too-early",
        Domain.Verdicts.Verdict.TooLate => "too-late",
        _ => "not-assessable",
    };

    public static string Basis(VerdictBasis basis) => basis == VerdictBasis.Normative ? "normative" : "band";

    public static string Source(EdgeSource source) => source switch
    {
        EdgeSource.NormativePoint => "normative",
        EdgeSource.Interpolated => "interpolated",
        EdgeSource.Extrapolated => "i2t-extrapolated",
        EdgeSource.Instantaneous => "instantaneous",
        _ => "none",
    };

    public static string Seconds(Seconds? value) => value is { } s ? s.ToString() : "-";
}
