using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// Every requirement on the trip time at one test current: the minimums (no trip before) and maximums (trip by), each
/// with its strength and the conditions it assumes. <see cref="For"/> reduces them to the band a test under given
/// conditions is judged against; <c>envelope</c> prints the same reduction, so the two always agree.
/// </summary>
/// <param name="Current">The current the band was evaluated at.</param>
/// <param name="Multiple">That current over the envelope's reference current.</param>
/// <param name="Minimums">The no-trip-before requirements at this current, guaranteed and typical.</param>
/// <param name="Maximums">The trip-by requirements at this current, guaranteed and typical.</param>
/// <param name="NoRequirement">When not null, the standard sets no requirement at this current, and this says why.</param>
public sealed record TripBand(
    Amperes Current,
    CurrentMultiple Multiple,
    IReadOnlyList<BandEdge> Minimums,
    IReadOnlyList<BandEdge> Maximums,
    string? NoRequirement)
{
    /// <summary>Whether any requirement applies at this current.</summary>
    public bool HasRequirement => NoRequirement is null;

    /// <summary>A band with no requirement, and why.</summary>
    public static TripBand None(Amperes current, CurrentMultiple multiple, string why) => new(current, multiple, [], [], why);

    /// <summary>A band from its edges; with no guaranteed edge on either side it has no requirement, and <paramref name="whyNone"/> says why.</summary>
    public static TripBand Of(Amperes current, CurrentMultiple multiple, IReadOnlyList<BandEdge> minimums, IReadOnlyList<BandEdge> maximums, string whyNone) =>
        AnyGuaranteed(minimums) || AnyGuaranteed(maximums)
            ? new TripBand(current, multiple, minimums, maximums, null)
            : new TripBand(current, multiple, minimums, maximums, whyNone);

    private static bool AnyGuaranteed(IReadOnlyList<BandEdge> edges)
    {
        for (var i = 0; i < edges.Count; i++)
        {
            if (edges[i].Strength == EdgeStrength.Guaranteed)
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>
    /// The band a test under <paramref name="conditions"/> is held to: the latest guaranteed minimum it could break (one
    /// run no hotter than that minimum assumes) and the earliest guaranteed maximum it could break (one run at least as
    /// hot), with the typical edges likewise where they are narrower.
    /// </summary>
    public AppliedBand For(TestConditions conditions)
    {
        var min = Tightest(Minimums, EdgeStrength.Guaranteed, conditions, minimum: true);
        var max = Tightest(Maximums, EdgeStrength.Guaranteed, conditions, minimum: false);
        var typicalMin = Tightest(Minimums, EdgeStrength.Typical, conditions, minimum: true);
        var typicalMax = Tightest(Maximums, EdgeStrength.Typical, conditions, minimum: false);
        if (typicalMin is { } tn && min is { } gn && !Later(tn, gn))
        {
            typicalMin = null;
        }

        if (typicalMax is { } tx && max is { } gx && !Earlier(tx, gx))
        {
            typicalMax = null;
        }

        var why = NoRequirement ?? "no requirement on this side for these test conditions";
        return new AppliedBand(Current, Multiple, conditions,
            min ?? BandEdge.NoMinimum(why), max ?? BandEdge.NoMaximum(why), typicalMin, typicalMax, NoRequirement);
    }

    /// <summary>
    /// The latest minimum that a test run no hotter than it assumes could break, or the earliest maximum that a test run at
    /// least as hot could, among the edges of one strength. Four calls for every band a test is held to, so it walks the
    /// list by index with no delegate or enumerator to allocate.
    /// </summary>
    private static BandEdge? Tightest(IReadOnlyList<BandEdge> edges, EdgeStrength strength, TestConditions conditions, bool minimum)
    {
        BandEdge? best = null;
        for (var i = 0; i < edges.Count; i++)
        {
            var e = edges[i];
            if (e.Strength != strength || !(minimum ? e.TestAtMostAsHot(conditions) : e.TestAtLeastAsHot(conditions)))
            {
                continue;
            }

            if (best is not { } b || (minimum ? Later(e, b) : Earlier(e, b)))
            {
                best = e;
            }
        }

        return best;
    }

    // A minimum of null (never trip) is the latest of all; a strict limit is tighter than an inclusive one at the same time.
    private static bool Later(BandEdge a, BandEdge b) => (a.Limit, b.Limit) switch
    {
        (null, null) => false,
        (null, _) => true,
        (_, null) => false,
        ({ } x, { } y) => x > y || (x == y && a.Strict && !b.Strict),
    };

    // A maximum of null (unbounded) is the earliest of none.
    private static bool Earlier(BandEdge a, BandEdge b) => (a.Limit, b.Limit) switch
    {
        (null, _) => false,
        (_, null) => true,
        ({ } x, { } y) => x < y || (x == y && a.Strict && !b.Strict),
    };
}
