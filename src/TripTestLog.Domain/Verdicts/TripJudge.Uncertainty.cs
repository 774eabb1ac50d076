using System.Globalization;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>
/// The lab's decision rule on a verdict already given by simple acceptance. The deciding quantity is the trip (or hold)
/// time against the limit T(I) of the deciding edge; its combined standard uncertainty is u² = u(t)² + (∂T/∂I · u(I))²
/// (GUM, JCGM 100:2008, 5.1.2), each instrument accuracy ±a taken as rectangular, u = a / √3 (GUM 4.3.7), and U = k u.
/// Where the limit jumps with current (a point's window) no slope can carry the current's share: the test is then also
/// judged with the point window widened by the current's expanded uncertainty.
/// </summary>
public static partial class TripJudge
{
    // The relative step of the central difference that gives ∂T/∂I: small beside a test set's current accuracy.
    private const double SlopeStep = 0.005;

    /// <summary>
    /// <paramref name="simple"/> under <paramref name="rule"/>: simple keeps it and reports the uncertainty; guarded turns a
    /// pass or a failure within the guard band (<paramref name="guardBandFactor"/> x U) of its limit, or one the current's
    /// uncertainty could change, into not-assessable; non-binary keeps the verdict and states its conformity.
    /// </summary>
    public static TripAssessment ApplyRule(TripAssessment simple, ITripEnvelope envelope, TestConditions conditions, ResolvedAccuracy accuracy,
        DecisionRule rule, double guardBandFactor = 1.0)
    {
        ArgumentNullException.ThrowIfNull(simple);
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(accuracy);
        var m = simple.Measurement;
        var windowed = envelope as PointWindowEnvelope ?? PointWindowEnvelope.Of(envelope);
        var k = accuracy.CoverageFactor;
        var t = m.Outcome.Time;
        var uT = accuracy.TimeStandard(t);
        var uI = accuracy.CurrentStandard(m.Current);
        var decides = simple.Verdict == Verdict.Pass || simple.IsFailure;

        // The edges a decision rests on: the broken one for a failure, every closed one for a pass or an open question.
        var edges = new List<(BandEdge Edge, bool Minimum)>();
        var band = simple.Band;
        if (simple.Verdict == Verdict.TooEarly)
        {
            edges.Add((band.Minimum, true));
        }
        else if (simple.Verdict == Verdict.TooLate)
        {
            edges.Add((band.Maximum, false));
        }
        else
        {
            if (!band.Minimum.IsOpen && band.Minimum.Limit is not null)
            {
                edges.Add((band.Minimum, true));
            }

            if (band.Maximum.Limit is not null)
            {
                edges.Add((band.Maximum, false));
            }
        }

        GuardedEdge? deciding = null;
        var neighbours = edges.Count > 0 ? Neighbours(windowed, m.Current, conditions) : default;
        foreach (var (edge, minimum) in edges)
        {
            if (edge.Limit is not { } limit)
            {
                continue;
            }

            var slope = Slope(neighbours, m.Current, edge, minimum);
            var u = k * Math.Sqrt((uT * uT) + (slope * uI * slope * uI));
            var inside = minimum ? t.Value - limit.Value : limit.Value - t.Value;
            var margin = simple.IsFailure ? -inside : inside;
            var g = new GuardedEdge(edge, minimum, u, guardBandFactor * u, margin);
            if (deciding is null || g.Spare < deciding.Spare)
            {
                deciding = g;
            }
        }

        // A pass proved by holding a no-trip point rests on the time held, read by the same timer: the hold must outlast
        // the point's time by the guard band too (row a's hour held for exactly an hour proves it only as written).
        if (simple.Verdict == Verdict.Pass && !m.Outcome.Tripped && simple.Point is { MustHoldFor: { } need } held
            && string.Equals(simple.Proved, held.Requirement, StringComparison.Ordinal))
        {
            var u = k * uT;
            var g = new GuardedEdge(held.HoldEdge(carried: false), true, u, guardBandFactor * u, t.Value - need.Value);
            if (deciding is null || g.Spare < deciding.Spare)
            {
                deciding = g;
            }
        }

        var currentWhy = rule != DecisionRule.Simple && decides ? CurrentDoubt(simple, windowed, conditions, guardBandFactor * k * uI) : null;
        var conditional = rule != DecisionRule.Simple && decides && (deciding is { Spare: < 0 } || currentWhy is not null);
        Conformity? conformity = rule != DecisionRule.NonBinary || !decides ? null
            : simple.Verdict == Verdict.Pass ? (conditional ? Conformity.ConditionalPass : Conformity.Pass)
            : conditional ? Conformity.ConditionalFail : Conformity.Fail;
        var words = accuracy.Words(time: true, current: true, resistance: false, insulation: false);
        var uncertainty = new VerdictUncertainty(rule, Seconds.Of(deciding?.U ?? k * uT), k * uI, conformity, conditional, words, accuracy.FromDefaults);
        if (!conditional || rule != DecisionRule.Guarded)
        {
            return simple with { Uncertainty = uncertainty };
        }

        var why = new List<string>();
        if (deciding is { Spare: < 0 } d)
        {
            var side = d.Minimum ? "minimum" : "maximum";
            var where = d.Margin >= 0 ? (simple.IsFailure ? "past" : "inside") : (simple.IsFailure ? "short of" : "outside");
            why.Add($"{m.Outcome} is {Num(Math.Abs(d.Margin))} s {where} the {d.Edge.Limit} {side} ({d.Edge.Requirement}), and the guard band is "
                + $"{Num(d.W)} s (U = {Num(d.U)} s)");
        }

        if (currentWhy is not null)
        {
            why.Add(currentWhy);
        }

        return simple with
        {
            Verdict = Verdict.NotAssessable,
            Proved = null,
            Advisories = [],
            RetestAt = simple.Point,
            Uncertainty = uncertainty,
            Reason = $"within the measurement uncertainty of the limit: {string.Join("; ", why)}; simple acceptance would say {Word(simple.Verdict)}. "
                + $"Retest with a more accurate instrument ({words}) [{simple.Reason}]",
        };
    }

    /// <summary>
    /// The window a trip at <paramref name="current"/> must fall in to pass under the guarded rule: each closed limit of
    /// <paramref name="window"/> moved inward by <paramref name="guardBandFactor"/> x U, with U the expanded uncertainty of
    /// a trip at that limit (the time accuracy at the limit, and the current's through the limit's slope, as the check
    /// weighs them). A limit that cannot move below zero stays at zero.
    /// </summary>
    public static GuardedWindow GuardedWindowOf(ITripEnvelope envelope, Amperes current, TestConditions conditions, AppliedBand window, ResolvedAccuracy accuracy,
        double guardBandFactor = 1.0)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(window);
        ArgumentNullException.ThrowIfNull(accuracy);
        var windowed = envelope as PointWindowEnvelope ?? PointWindowEnvelope.Of(envelope);
        var uI = accuracy.CurrentStandard(current);
        var neighbours = Neighbours(windowed, current, conditions);
        double? W(BandEdge edge, bool minimum)
        {
            if (edge.Limit is not { } limit || edge.IsOpen || (minimum && limit.Value == 0))
            {
                return null;
            }

            var uT = accuracy.TimeStandard(limit);
            var slope = Slope(neighbours, current, edge, minimum);
            return guardBandFactor * accuracy.CoverageFactor * Math.Sqrt((uT * uT) + (slope * uI * slope * uI));
        }

        var wMin = W(window.Minimum, true);
        var wMax = W(window.Maximum, false);
        return new GuardedWindow(
            wMin is { } n ? Seconds.Of(window.Minimum.Limit!.Value.Value + n) : null,
            wMax is { } x ? Seconds.Of(Math.Max(0, window.Maximum.Limit!.Value.Value - x)) : null,
            wMin, wMax);
    }

    /// <summary>
    /// The shortest hold that proves a no-trip point's <paramref name="need"/> under the guarded rule: it must outlast the
    /// point's time by the guard band, U of the time held itself (the check's rule for a pass proved by holding).
    /// </summary>
    public static Seconds GuardedHold(Seconds need, ResolvedAccuracy accuracy, double guardBandFactor = 1.0)
    {
        ArgumentNullException.ThrowIfNull(accuracy);

        // held = need + f k u(held): u grows with the time held, so a few steps settle it (each step moves by f k 0.3 %).
        var held = need.Value;
        for (var i = 0; i < 8; i++)
        {
            held = need.Value + (guardBandFactor * accuracy.CoverageFactor * accuracy.TimeStandard(Seconds.Of(held)));
        }

        return Seconds.Of(held);
    }

    private sealed record GuardedEdge(BandEdge Edge, bool Minimum, double U, double W, double Margin)
    {
        public double Spare => Margin - W;
    }

    // ∂T/∂I of the deciding edge, by a central difference where the same requirement holds on both sides, else one-sided;
    // zero where the limit jumps on both sides (the current check then carries the current's share).
    private static double Slope((AppliedBand Below, AppliedBand Above) neighbours, Amperes current, BandEdge edge, bool minimum)
    {
        var mid = edge.Limit!.Value.Value;
        var dI = current.Value * SlopeStep;
        double? At(AppliedBand applied)
        {
            var e = minimum ? applied.Minimum : applied.Maximum;
            return e.Limit is { } l && !e.IsOpen && SameRequirement(e, edge) ? l.Value : null;
        }

        return (At(neighbours.Below), At(neighbours.Above)) switch
        {
            ({ } lo, { } hi) => (hi - lo) / (2 * dI),
            ({ } lo, null) => (mid - lo) / dI,
            (null, { } hi) => (hi - mid) / dI,
            _ => 0.0,
        };
    }

    // The band a step below and a step above the test current, read once for every edge's slope; only its limits and
    // which requirement each is are used, so the offset's words are not written.
    private static (AppliedBand Below, AppliedBand Above) Neighbours(PointWindowEnvelope envelope, Amperes current, TestConditions conditions) =>
        (envelope.LimitsAt(Amperes.Of(current.Value * (1 - SlopeStep))).For(conditions), envelope.LimitsAt(Amperes.Of(current.Value * (1 + SlopeStep))).For(conditions));

    // The same requirement on both sides of the current: a point's limit moved for the offset keeps its requirement's
    // words before the "; tested ... %" that says how far it moved.
    private static bool SameRequirement(BandEdge a, BandEdge b) =>
        a.Source == b.Source && a.PointLabel == b.PointLabel && a.Anchor == b.Anchor && a.Carried == b.Carried
        && Words(a.Requirement).SequenceEqual(Words(b.Requirement));

    private static ReadOnlySpan<char> Words(string requirement) =>
        requirement.AsSpan(0, requirement.IndexOf(';') is var i and >= 0 ? i : requirement.Length);

    // The verdict judged again with the point window widened by the current's guard band: a test that far from a point
    // may have been a test of it (the window itself is the lab's test-current tolerance, so the current is not also moved
    // within it). Where the verdict differs, the decision depends on where within its uncertainty the current really was.
    private static string? CurrentDoubt(TripAssessment simple, PointWindowEnvelope envelope, TestConditions conditions, double guardAmperes)
    {
        var m = simple.Measurement;
        if (guardAmperes <= 0 || Assess(envelope, m, conditions).Verdict != simple.Verdict)
        {
            return null;
        }

        var widened = envelope.Widened(guardAmperes / m.Current.Value);
        var w = Assess(widened, m, conditions).Verdict;
        var same = simple.IsFailure ? w == simple.Verdict : w == Verdict.Pass;
        return same ? null
            : $"the test current {m.Current} ± {Num(guardAmperes)} A may lie within ±{Num(widened.Window * 100)} % of a standard point, and judged so the verdict would be {Word(w)}";
    }

    private static string Word(Verdict v) => v switch
    {
        Verdict.Pass => "pass",
        Verdict.TooEarly => "too early",
        Verdict.TooLate => "too late",
        _ => "not assessable",
    };

    private static string Num(double x) => x.ToString(x >= 100 ? "0" : x >= 1 ? "0.0##" : "0.0###", CultureInfo.InvariantCulture);
}
