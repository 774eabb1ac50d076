using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>One side of the trip-time band at a given current, with the requirement it comes from.</summary>
/// <param name="Limit">The edge time. For a maximum, null means unbounded (no trip required). For a minimum, zero means the
/// release may act at once, and null means it must not act at all at this current (e.g. a relay below its pickup).</param>
/// <param name="Source">Whether the edge is normative, interpolated, extrapolated, or absent.</param>
/// <param name="Requirement">Plain words naming the requirement, e.g. "IEC 60898-1 Table 7, c: 2.55 In, trip after more than 1 s".</param>
/// <param name="Start">The start condition the requirement behind this edge assumes.</param>
public readonly record struct BandEdge(Seconds? Limit, EdgeSource Source, string Requirement, StartCondition Start)
{
    /// <summary>True when the edge sets no limit: a minimum of zero or an unbounded maximum.</summary>
    public bool IsOpen => Source == EdgeSource.None;

    /// <summary>A minimum edge that sets no limit: the release may act at once.</summary>
    public static BandEdge NoMinimum(string why) => new(Seconds.Zero, EdgeSource.None, why, StartCondition.Cold);

    /// <summary>A minimum edge that forbids any trip at this current.</summary>
    public static BandEdge NeverTrip(string why) => new(null, EdgeSource.Setting, why, StartCondition.Cold);

    /// <summary>A maximum edge that sets no limit: no trip is required at this current.</summary>
    public static BandEdge NoMaximum(string why) => new(null, EdgeSource.None, why, StartCondition.Cold);
}
