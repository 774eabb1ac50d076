using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The trip-time envelope of one device: for any current, the earliest and latest allowed trip time
/// and the requirement each edge comes from. Edges are monotone non-increasing in current and the
/// minimum never exceeds the maximum.
/// </summary>
public interface ITripEnvelope
{
    /// <summary>The standard the envelope follows, e.g. "IEC 60898-1".</summary>
    string Standard { get; }

    /// <summary>The name of the reference current, e.g. "In".</summary>
    string ReferenceName { get; }

    /// <summary>The reference current that multiples are taken of.</summary>
    Amperes Reference { get; }

    /// <summary>The points the standard itself defines, in rising current.</summary>
    IReadOnlyList<NormativePoint> Points { get; }

    /// <summary>The band at <paramref name="current"/>.</summary>
    TripBand At(Amperes current);

    /// <summary>Whether a trip at <paramref name="current"/> is the thermal (long-time) release's, which ambient temperature shifts.</summary>
    bool IsThermal(Amperes current);
}
