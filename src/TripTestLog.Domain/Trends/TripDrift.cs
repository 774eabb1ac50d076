using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Trends;

/// <summary>
/// How far a trip time at one test point has moved from the device's baseline, measured two ways: on a log time axis
/// (a doubling is the same move at 10 ms as at 100 s) and as a move of its position within the band (0 at the minimum
/// edge, 1 at the maximum, on the same log axis), which says whether it moved towards an edge.
/// </summary>
/// <param name="Decades">log10(latest / baseline): positive when slower.</param>
/// <param name="PositionShift">Latest position in band minus the baseline's; null when either band had an open edge.</param>
public readonly record struct TripDrift(double Decades, double? PositionShift)
{
    /// <summary>The move as a percentage change of the trip time: 100 × (10^decades − 1).</summary>
    public double TimeChangePercent => 100 * (Math.Pow(10, Decades) - 1);

    /// <summary>The drift from <paramref name="baseline"/> to <paramref name="latest"/>, with their band positions when known.</summary>
    public static TripDrift Between(Seconds baseline, double? baselinePosition, Seconds latest, double? latestPosition) =>
        new(Math.Log10(latest.Value / baseline.Value), baselinePosition is { } b && latestPosition is { } l ? l - b : null);
}
