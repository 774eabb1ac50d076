namespace TripTestLog.Domain.Trends;

/// <summary>Median-based statistics: one wild reading moves them little, which suits a handful of tests a year.</summary>
public static class RobustStatistics
{
    /// <summary>
    /// The factor that makes the median absolute deviation comparable with a standard deviation for normal data:
    /// 0.6745, the normal distribution's 75th percentile (Iglewicz and Hoaglin, 1993).
    /// </summary>
    public const double NormalQuartile = 0.6745;

    /// <summary>The median of <paramref name="values"/>; throws <see cref="ArgumentException"/> when there are none.</summary>
    public static double Median(IEnumerable<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var sorted = values.ToArray();
        if (sorted.Length == 0)
        {
            throw new ArgumentException("the median of no values is undefined", nameof(values));
        }

        Array.Sort(sorted);
        var mid = sorted.Length / 2;
        return sorted.Length % 2 == 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
    }

    /// <summary>The median absolute deviation from the median: median(|x − median(x)|).</summary>
    public static double MedianAbsoluteDeviation(IReadOnlyCollection<double> values)
    {
        var median = Median(values);
        return Median(values.Select(v => Math.Abs(v - median)));
    }

    /// <summary>
    /// The modified z-score of <paramref name="value"/> among a group with <paramref name="median"/> and
    /// <paramref name="mad"/>: 0.6745 (x − median) / MAD (Iglewicz and Hoaglin, 1993). Null when MAD is zero, where the
    /// score is undefined: more than half the group is identical.
    /// </summary>
    public static double? ModifiedZScore(double value, double median, double mad) =>
        mad > 0 ? NormalQuartile * (value - median) / mad : null;
}
