using TripTestLog.Domain.Trends;

namespace TripTestLog.Domain.Tests.Trends;

/// <summary>The modified z-score of Iglewicz and Hoaglin (1993), worked by hand.</summary>
public sealed class RobustStatisticsTests
{
    private static readonly double[] Group = [2.1, 2.3, 2.2, 2.4, 2.2, 5.0, 2.3, 2.1];

    [Fact]
    public void ModifiedZ_FlagsTheWildValue_AndNotItsNeighbours()
    {
        // Sorted 2.1 2.1 2.2 2.2 2.3 2.3 2.4 5.0 -> median 2.25. |x - 2.25|: 0.15 0.05 0.05 0.15 0.05 2.75 0.05 0.15
        // -> sorted 0.05 x4, 0.15 x3, 2.75 -> MAD 0.10. M(5.0) = 0.6745 x 2.75 / 0.10 = 18.549; M(2.4) = 1.0118.
        var median = RobustStatistics.Median(Group);
        var mad = RobustStatistics.MedianAbsoluteDeviation(Group);

        Assert.Equal(2.25, median, 12);
        Assert.Equal(0.10, mad, 12);
        Assert.Equal(18.54875, RobustStatistics.ModifiedZScore(5.0, median, mad)!.Value, 9);
        Assert.Equal(1.01175, RobustStatistics.ModifiedZScore(2.4, median, mad)!.Value, 9);
        Assert.Single(Group, x => Math.Abs(RobustStatistics.ModifiedZScore(x, median, mad)!.Value) > 3.5);
    }

    [Fact]
    public void ModifiedZ_IsUndefined_WhenMostOfTheGroupIsIdentical()
    {
        double[] same = [1, 1, 1, 1, 2];

        Assert.Equal(0, RobustStatistics.MedianAbsoluteDeviation(same));
        Assert.Null(RobustStatistics.ModifiedZScore(2, RobustStatistics.Median(same), 0));
    }

    [Fact]
    public void Median_OfNothing_IsRefused() => Assert.Throws<ArgumentException>(() => RobustStatistics.Median([]));

    [Fact]
    public void MedianInPlace_GivesTheSortedMedian_ForOddAndEvenCounts_WithTiesAndRuns()
    {
        // The median by definition (sort, take the middle or the mean of the two middles) against selection, on
        // random data of every size to 400, with ties (values drawn from a few levels), sorted and reversed runs.
        var random = new Random(20261205);
        for (var n = 1; n <= 400; n++)
        {
            foreach (var shape in new[] { "random", "ties", "sorted", "reversed", "constant" })
            {
                var values = shape switch
                {
                    "ties" => Enumerable.Range(0, n).Select(_ => (double)random.Next(5)).ToArray(),
                    "sorted" => Enumerable.Range(0, n).Select(i => i * 0.5).ToArray(),
                    "reversed" => Enumerable.Range(0, n).Select(i => -i * 0.5).ToArray(),
                    "constant" => Enumerable.Repeat(3.25, n).ToArray(),
                    _ => Enumerable.Range(0, n).Select(_ => random.NextDouble() * 200 - 100).ToArray(),
                };
                var sorted = values.Order().ToArray();
                var expected = n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;

                Assert.Equal(expected, RobustStatistics.MedianInPlace(values));
            }
        }
    }

    [Fact]
    public void MedianInPlace_OfNothing_IsRefused() => Assert.Throws<ArgumentException>(() => RobustStatistics.MedianInPlace([]));
}
