namespace TripTestLog.Domain.Trends;

/// <summary>
/// The Theil–Sen line: the slope is the median of the slopes between every pair of observations, the intercept the
/// median of value − slope × year (Sen, 1968, "Estimates of the regression coefficient based on Kendall's tau", JASA
/// 63:1379–1389). A wild reading, a mistyped value, barely moves it, unlike a least-squares fit.
/// </summary>
public static class TheilSen
{
    /// <summary>The scale that turns a median absolute residual into a standard-deviation equivalent: 1 / 0.6745.</summary>
    private const double SpreadScale = 1.4826;

    /// <summary>
    /// Fits the line; null when fewer than two observations lie at distinct times (no slope can be formed).
    /// </summary>
    public static TrendLine? Fit(IReadOnlyList<TrendPoint> points)
    {
        ArgumentNullException.ThrowIfNull(points);
        var slopes = new List<double>(points.Count * (points.Count - 1) / 2);
        for (var i = 0; i < points.Count; i++)
        {
            for (var j = i + 1; j < points.Count; j++)
            {
                var dx = points[j].Year - points[i].Year;
                if (dx != 0)
                {
                    slopes.Add((points[j].Value - points[i].Value) / dx);
                }
            }
        }

        if (slopes.Count == 0)
        {
            return null;
        }

        var slope = RobustStatistics.Median(slopes);
        var intercept = RobustStatistics.Median(points.Select(p => p.Value - slope * p.Year));
        var spread = SpreadScale * RobustStatistics.Median(points.Select(p => Math.Abs(p.Value - intercept - slope * p.Year)));
        return new TrendLine(slope, intercept, spread, points.Count, points.Max(p => p.Year));
    }
}
