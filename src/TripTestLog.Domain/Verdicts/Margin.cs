namespace TripTestLog.Domain.Verdicts;

/// <summary>Where a measured time lies relative to the band, on a logarithmic time axis.</summary>
/// <param name="PositionInBand">0 at the minimum edge, 1 at the maximum, outside 0..1 when outside the band; null when either edge is open.</param>
/// <param name="DecadesToNearerEdge">Distance in decades (log10 of seconds) to the nearer closed edge: positive inside the band, negative outside; null when both edges are open.</param>
/// <param name="NearerEdge">Which edge that distance is to.</param>
public readonly record struct Margin(double? PositionInBand, double? DecadesToNearerEdge, BandSide? NearerEdge);
