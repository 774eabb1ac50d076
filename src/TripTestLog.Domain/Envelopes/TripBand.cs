using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>The allowed trip-time band at one test current.</summary>
/// <param name="Current">The current the band was evaluated at.</param>
/// <param name="Multiple">That current over the envelope's reference current.</param>
/// <param name="Minimum">The device must not trip before this edge.</param>
/// <param name="Maximum">The device must trip by this edge.</param>
/// <param name="NoRequirement">When not null, the standard sets no band at this current, and this says why.</param>
public sealed record TripBand(Amperes Current, CurrentMultiple Multiple, BandEdge Minimum, BandEdge Maximum, string? NoRequirement)
{
    /// <summary>Whether the standard sets a band at this current.</summary>
    public bool HasRequirement => NoRequirement is null;
}
