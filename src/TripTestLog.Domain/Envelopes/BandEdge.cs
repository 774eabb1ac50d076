using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// One requirement on one side of the trip-time band at a given current: its time, where it comes from, whether it may
/// fail a breaker, whether the limit itself is allowed, and the test conditions it assumes.
/// </summary>
/// <param name="Limit">The edge time. For a maximum, null means unbounded (no trip required). For a minimum, zero means the
/// release may act at once, and null means it must not act at all at this current (e.g. a relay below its pickup).</param>
/// <param name="Source">Where the value comes from: a standard's point, a formula, a setting, a drawn line.</param>
/// <param name="Requirement">Plain words naming the requirement, e.g. "IEC 60898-1 Table 7 c: 2.55 In from cold, trip after more than 1 s".</param>
/// <param name="Start">The start condition the requirement assumes (ignored when <see cref="AnyStart"/>).</param>
public sealed record BandEdge(Seconds? Limit, EdgeSource Source, string Requirement, StartCondition Start)
{
    /// <summary>Guaranteed edges may fail a breaker; typical ones only raise an advisory.</summary>
    public EdgeStrength Strength { get; init; }

    /// <summary>
    /// True when the limit itself lies outside the allowed range, as the table writes it: "1 s &lt; t" makes a trip at
    /// exactly 1 s too early, "t &lt; 0.1 s" makes a trip at exactly 0.1 s too late. False for "t ≤ T" limits.
    /// </summary>
    public bool Strict { get; init; }

    /// <summary>True when the requirement holds whatever the thermal start: an electronic unit without thermal memory or
    /// a magnetic release times from current, not from heat.</summary>
    public bool AnyStart { get; init; }

    /// <summary>The poles the requirement assumes loaded; null when it holds whichever poles carry the current.</summary>
    public PoleLoading? Loading { get; init; }

    /// <summary>The label of the standard's point this edge is, or is carried from; null for other edges.</summary>
    public string? PointLabel { get; init; }

    /// <summary>
    /// True when the requirement is stated at another current and carried here in the direction physics gives it: it
    /// may fail a breaker, but a result within it proves nothing about the requirement at its own current.
    /// </summary>
    public bool Carried { get; init; }

    /// <summary>For a curve-table row, the multiple the row is stated at: a test within the point window of it proves it.</summary>
    public double? Anchor { get; init; }

    /// <summary>For a "must not operate at all" minimum, how long a hold must last to show it; null when a hold cannot.</summary>
    public Seconds? ProvenByHolding { get; init; }

    /// <summary>True when the edge sets no limit: a minimum of zero or an unbounded maximum.</summary>
    public bool IsOpen => Source == EdgeSource.None;

    /// <summary>A minimum edge that sets no limit: the release may act at once.</summary>
    public static BandEdge NoMinimum(string why) => new(Seconds.Zero, EdgeSource.None, why, StartCondition.Cold) { AnyStart = true };

    /// <summary>A minimum edge that forbids any trip at this current.</summary>
    public static BandEdge NeverTrip(string why) => new(null, EdgeSource.Setting, why, StartCondition.Cold) { AnyStart = true };

    /// <summary>A maximum edge that sets no limit: no trip is required at this current.</summary>
    public static BandEdge NoMaximum(string why) => new(null, EdgeSource.None, why, StartCondition.Cold) { AnyStart = true };

    /// <summary>
    /// Whether a test under <paramref name="test"/> ran at least as hot as this requirement assumes (warm against cold,
    /// all poles against one). Such a test trips no later than the requirement's own test would.
    /// </summary>
    public bool TestAtLeastAsHot(TestConditions test) =>
        (AnyStart || Start == StartCondition.Cold || test.Start == StartCondition.Warm)
        && (Loading is null || Loading == PoleLoading.OnePole || test.Loading == PoleLoading.AllPoles);

    /// <summary>Whether a test under <paramref name="test"/> ran no hotter than this requirement assumes; it trips no sooner.</summary>
    public bool TestAtMostAsHot(TestConditions test) =>
        (AnyStart || Start == StartCondition.Warm || test.Start == StartCondition.Cold)
        && (Loading is null || Loading == PoleLoading.AllPoles || test.Loading == PoleLoading.OnePole);

    /// <summary>As a minimum: whether a trip after <paramref name="time"/> comes too soon for it.</summary>
    public bool TripIsBefore(Seconds time) =>
        Limit is not { } t || (Strict ? time <= t : time < t);

    /// <summary>As a maximum: whether a trip after <paramref name="time"/> comes too late for it.</summary>
    public bool TripIsAfter(Seconds time) =>
        Limit is { } t && (Strict ? time >= t : time > t);

    /// <summary>The assumption in words, for reasons: e.g. "from cold, all poles loaded".</summary>
    public string Assumes()
    {
        var start = AnyStart ? "" : Start == StartCondition.Cold ? "from cold" : "from warm";
        var poles = Loading switch
        {
            PoleLoading.AllPoles => "all poles loaded",
            PoleLoading.OnePole => "one pole loaded",
            _ => "",
        };
        return string.Join(", ", new[] { start, poles }.Where(s => s.Length > 0));
    }
}
