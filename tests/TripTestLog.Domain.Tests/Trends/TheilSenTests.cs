using TripTestLog.Domain.Trends;

namespace TripTestLog.Domain.Tests.Trends;

/// <summary>The Theil–Sen line (Sen 1968) against examples worked by hand, the arithmetic written beside each.</summary>
public sealed class TheilSenTests
{
    [Fact]
    public void Slope_IsTheMedianOfPairwiseSlopes_AndInterceptTheMedianOfResidualOffsets()
    {
        // Points (2021,10) (2022,12) (2023,11) (2024,15) (2025,16). The ten pairwise slopes:
        // 2, 0.5, 5/3, 1.5, -1, 1.5, 4/3, 4, 2.5, 1 -> sorted -1, 0.5, 1, 1.333, 1.5, 1.5, 1.667, 2, 2.5, 4 -> median 1.5.
        // y - 1.5x: -3021.5, -3021, -3023.5, -3021, -3021.5 -> median -3021.5.
        // Residuals 0, 0.5, -2, 0.5, 0 -> median |r| 0.5 -> spread 1.4826 x 0.5 = 0.7413.
        var line = TheilSen.Fit([new(2021, 10), new(2022, 12), new(2023, 11), new(2024, 15), new(2025, 16)])!;

        Assert.Equal(1.5, line.Slope, 12);
        Assert.Equal(-3021.5, line.Intercept, 9);
        Assert.Equal(0.7413, line.Spread, 9);
        Assert.Equal(16, line.At(2025), 9);
        Assert.Equal((5, 2025.0), (line.Count, line.LastYear));
    }

    [Theory]
    [InlineData(3)]
    [InlineData(12)]
    [InlineData(101)]
    [InlineData(300)]
    public void Fit_IsExactlyTheLineByDefinition_ForLongHistoriesWithRepeatedDates(int tests)
    {
        // Sen (1968) by the letter: every pairwise slope at distinct times, sorted, the middle; then the median offset
        // and the median absolute residual. The fit selects its medians instead of sorting; the numbers must not move.
        var random = new Random(tests);
        List<TrendPoint> points = [.. Enumerable.Range(0, tests).Select(i => new TrendPoint(2000 + random.Next(0, tests / 3 + 2) * 0.25, Math.Log10(10 + random.NextDouble() * 30)))];
        var slopes = new List<double>();
        for (var i = 0; i < points.Count; i++)
        {
            for (var j = i + 1; j < points.Count; j++)
            {
                if (points[j].Year != points[i].Year)
                {
                    slopes.Add((points[j].Value - points[i].Value) / (points[j].Year - points[i].Year));
                }
            }
        }

        var slope = SortedMedian(slopes);
        var intercept = SortedMedian(points.Select(p => p.Value - slope * p.Year));
        var spread = 1.4826 * SortedMedian(points.Select(p => Math.Abs(p.Value - intercept - slope * p.Year)));

        var line = TheilSen.Fit(points)!;

        Assert.Equal((slope, intercept, spread, tests, points.Max(p => p.Year)), (line.Slope, line.Intercept, line.Spread, line.Count, line.LastYear));
    }

    private static double SortedMedian(IEnumerable<double> values)
    {
        var sorted = values.Order().ToArray();
        return sorted.Length % 2 == 1 ? sorted[sorted.Length / 2] : (sorted[sorted.Length / 2 - 1] + sorted[sorted.Length / 2]) / 2;
    }

    [Fact]
    public void OneWildReading_DoesNotMoveTheSlope_WhereLeastSquaresWouldGiveEightTimesIt()
    {
        // (0,0) (1,1) (2,2) (3,3) (4,40): slopes 1 (seven pairs), 10, 13, 19, 37 -> median 1; y - x: 0,0,0,0,36 -> 0.
        // Least squares: Sxy = 82, Sxx = 10 -> slope 8.2.
        var line = TheilSen.Fit([new(0, 0), new(1, 1), new(2, 2), new(3, 3), new(4, 40)])!;

        Assert.Equal(1, line.Slope, 12);
        Assert.Equal(0, line.Intercept, 12);
    }

    [Fact]
    public void Reaches_GivesTheYearTheLineMeetsALevel_OrTheLatestYearWhenAlreadyPast()
    {
        var line = TheilSen.Fit([new(2021, 10), new(2022, 12), new(2023, 11), new(2024, 15), new(2025, 16)])!;

        // (20 + 3021.5) / 1.5 = 2027.667
        Assert.Equal(2027.6667, line.Reaches(20)!.Value, 4);

        // A level the line has already passed (16 at 2025 is above 12) is reached at the latest observation.
        Assert.Equal(2025, line.Reaches(12));

        // A falling line. The slopes of (2021,16) (2022,15) (2023,11) (2024,12) (2025,10) are
        // -1, -2.5, -4/3, -1.5, -4, -1.5, -5/3, 1, -0.5, -2 -> sorted -4, -2.5, -2, -5/3, -1.5, -1.5, -4/3, -1, -0.5, 1 -> -1.5.
        var falling = TheilSen.Fit([new(2021, 16), new(2022, 15), new(2023, 11), new(2024, 12), new(2025, 10)])!;
        Assert.Equal(-1.5, falling.Slope, 12);
        Assert.Equal(2025, falling.Reaches(20));
        Assert.True(falling.Reaches(5) > 2025);

        // A flat line reaches nothing.
        Assert.Null(TheilSen.Fit([new(2021, 3), new(2022, 3), new(2023, 3)])!.Reaches(4));
    }

    [Fact]
    public void Fit_NeedsTwoDistinctTimes()
    {
        Assert.Null(TheilSen.Fit([new(2024, 1)]));
        Assert.Null(TheilSen.Fit([new(2024, 1), new(2024, 2)]));
    }

    [Fact]
    public void FractionalYears_CountDaysOfTheirOwnYear()
    {
        // 2024 is a leap year: 1 July is day 182 after 1 January, of 366.
        Assert.Equal(2024 + 182.0 / 366, TrendPoint.YearOf(new DateOnly(2024, 7, 1)), 12);
        Assert.Equal(new DateOnly(2024, 7, 1), TrendPoint.DateOf(TrendPoint.YearOf(new DateOnly(2024, 7, 1))));
    }
}
