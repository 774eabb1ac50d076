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

        // The pairs grow with the square of the tests: 300 tests make 44,850 slopes. They go into a pooled buffer and
        // the median is selected, not sorted, so a long history costs neither a sort nor a large-object allocation.
        var pairs = points.Count * (points.Count - 1) / 2;
        var buffer = System.Buffers.ArrayPool<double>.Shared.Rent(Math.Max(pairs, 1));
        try
        {
            var count = 0;
            for (var i = 0; i < points.Count; i++)
            {
                for (var j = i + 1; j < points.Count; j++)
                {
                    var dx = points[j].Year - points[i].Year;
                    if (dx != 0)
                    {
                        buffer[count++] = (points[j].Value - points[i].Value) / dx;
                    }
                }
            }

            if (count == 0)
            {
                return null;
            }

            var slope = RobustStatistics.MedianInPlace(buffer.AsSpan(0, count));
            var residuals = buffer.AsSpan(0, points.Count);
            for (var i = 0; i < points.Count; i++)
            {
                residuals[i] = points[i].Value - slope * points[i].Year;
            }

            var intercept = RobustStatistics.MedianInPlace(residuals);
            var lastYear = double.MinValue;
            for (var i = 0; i < points.Count; i++)
            {
                residuals[i] = Math.Abs(points[i].Value - intercept - slope * points[i].Year);
                lastYear = Math.Max(lastYear, points[i].Year);
            }

            var spread = SpreadScale * RobustStatistics.MedianInPlace(residuals);
            return new TrendLine(slope, intercept, spread, points.Count, lastYear);
        }
        finally
        {
            System.Buffers.ArrayPool<double>.Shared.Return(buffer);
        }
    }
}
