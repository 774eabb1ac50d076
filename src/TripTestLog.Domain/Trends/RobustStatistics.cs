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
        return MedianInPlace(values.ToArray());
    }

    /// <summary>
    /// The median of <paramref name="values"/>, found by selection (Hoare's quickselect), which reorders them: the same
    /// value as sorting would give, in time that grows with the count rather than faster. Throws
    /// <see cref="ArgumentException"/> when there are none.
    /// </summary>
    public static double MedianInPlace(Span<double> values)
    {
        if (values.Length == 0)
        {
            throw new ArgumentException("the median of no values is undefined", nameof(values));
        }

        var mid = values.Length / 2;
        var upper = Select(values, mid);
        if (values.Length % 2 == 1)
        {
            return upper;
        }

        // Selection leaves every value below the middle one to its left: the lower middle is their largest.
        var lower = values[0];
        for (var i = 1; i < mid; i++)
        {
            lower = Math.Max(lower, values[i]);
        }

        return (lower + upper) / 2;
    }

    // The k-th smallest value (from 0), with the values before it no larger and those after it no smaller. A middle-of-
    // three pivot keeps ordinary data near linear; a run that stops shrinking fast enough is finished by sorting.
    private static double Select(Span<double> values, int k)
    {
        var (left, right) = (0, values.Length - 1);
        var rounds = 0;
        while (left < right)
        {
            if (++rounds > 64)
            {
                values[left..(right + 1)].Sort();
                return values[k];
            }

            var middle = left + (right - left) / 2;
            var pivot = MiddleOfThree(values[left], values[middle], values[right]);
            var (i, j) = (left, right);
            while (i <= j)
            {
                while (values[i] < pivot)
                {
                    i++;
                }

                while (values[j] > pivot)
                {
                    j--;
                }

                if (i <= j)
                {
                    (values[i], values[j]) = (values[j], values[i]);
                    i++;
                    j--;
                }
            }

            if (k <= j)
            {
                right = j;
            }
            else if (k >= i)
            {
                left = i;
            }
            else
            {
                return values[k];
            }
        }

        return values[k];
    }

    private static double MiddleOfThree(double a, double b, double c) =>
        Math.Max(Math.Min(a, b), Math.Min(Math.Max(a, b), c));

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
