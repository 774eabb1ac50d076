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
}
