using ScottPlot.Plottables;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Trends;
using TripTestLog.Reports.Charts;

namespace TripTestLog.Reports.Tests;

/// <summary>Trend charts draw a forecast's own line, and it meets the limit on the finding's date.</summary>
public sealed class TrendChartTests
{
    [Fact]
    public void TheContactForecastLine_CrossesTheLimitAtTheFindingsDate()
    {
        // 5000, 5700, 6400, 7100 micro-ohm on 1 March 2021-2024 against an 8000 limit: the Theil–Sen line reaches 8000
        // about 1.3 years after the last reading; the finding's date is that year rounded to a day.
        PoleReading[] readings = [.. new[] { 5000.0, 5700, 6400, 7100 }.Select((r, i) => new PoleReading("1", new DateOnly(2021 + i, 3, 1), TestStage.AsFound, r, r, true, 10, 1, true))];
        var line = TheilSen.Fit([.. readings.Select(r => new TrendPoint(TrendPoint.YearOf(r.Date), r.CorrectedMicroOhms))])!;
        var on = TrendPoint.DateOf(line.Reaches(8000)!.Value);
        var forecast = new Finding(FindingKind.ContactTrendLimit, Severity.Plan, Charts.C16.Latest.Tag, TestedAt.OnDate(new DateOnly(2024, 3, 1)), "", "", [])
        {
            Pole = "1", ForecastOn = on, Trend = line,
        };

        var (x0, _, x1, y1) = ContactChart.ForecastLine(forecast, TrendPoint.YearOf(readings[0].Date));
        var plot = ContactChart.Build(readings, 8000, [forecast]);

        Assert.Equal(TrendPoint.YearOf(on), x1, 9);
        Assert.Equal(8000, y1, 0); // within half a micro-ohm: the date is rounded to a whole day (about 2 uOhm a day here)
        Assert.Equal(TrendPoint.YearOf(new DateOnly(2021, 3, 1)), x0, 9);
        Assert.InRange(on, new DateOnly(2025, 5, 1), new DateOnly(2025, 8, 1));

        // The dashes drawn for it lie on the finding's own line, and run to within a dash of that date.
        var dashes = plot.GetPlottables().OfType<LinePlot>().Where(l => l.Color == ChartStyle.Trend).ToList();
        Assert.NotEmpty(dashes);
        Assert.All(dashes, d => Assert.Equal(line.At(d.End.X), d.End.Y, 6));
        Assert.InRange(x1 - dashes.Max(d => d.End.X), 0, 3 * (x1 - x0) / 48);
    }

    [Fact]
    public void AContactChart_ShowsTheLimitLine()
    {
        PoleReading[] readings = [new("1", new DateOnly(2024, 3, 1), TestStage.AsFound, 5000, 5000, true, 10, 1, true), new("1", new DateOnly(2025, 3, 1), TestStage.AsFound, 5200, 5200, true, 10, 1, true)];

        var plot = ContactChart.Build(readings, 8000, []);

        var limit = plot.GetPlottables().OfType<HorizontalLine>().Single(l => l.LegendText == "maker's limit");
        Assert.Equal(8000, limit.Y);
        Assert.Contains("contact resistance at 20 °C, µΩ", Charts.SvgText(ChartStyle.Svg(plot)));
    }

    [Fact]
    public void AReadingFromAnUntraceableInstrument_IsRingedOnTheContactChart()
    {
        // Three readings of one pole, the middle one from a lapsed ohmmeter: exactly that point gets the ring, and the
        // legend names it; a chart with every reading traceable has no ring at all.
        PoleReading[] readings =
        [
            new("1", new DateOnly(2023, 3, 1), TestStage.AsFound, 5000, 5000, true, 10, 1, true),
            new("1", new DateOnly(2024, 3, 1), TestStage.AsFound, 5300, 5300, true, 10, 1, false),
            new("1", new DateOnly(2025, 3, 1), TestStage.AsFound, 5200, 5200, true, 10, 1, true),
        ];

        var rings = ContactChart.Build(readings, 8000, []).GetPlottables().OfType<Scatter>().Where(s => s.LegendText == "instrument not traceable").ToList();
        var none = ContactChart.Build([readings[0], readings[2]], 8000, []).GetPlottables().OfType<Scatter>().Where(s => s.LegendText == "instrument not traceable");

        var ring = Assert.Single(rings);
        var point = Assert.Single(ring.Data.GetScatterPoints());
        Assert.Equal(TrendPoint.YearOf(new DateOnly(2024, 3, 1)), point.X, 9);
        Assert.Equal(5300, point.Y);
        Assert.Empty(none);
    }

    [Fact]
    public void AnUntraceableTripTest_IsRingedOnTheDriftChart()
    {
        DriftChart.Point[] tests = [new(2022.2, 12, MarkKind.PassNormative), new(2023.2, 14, MarkKind.PassNormative, Traceable: false), new(2024.2, 13, MarkKind.PassNormative)];

        var ring = Assert.Single(DriftChart.Build("2.55 In cold", tests, 1, 60, null).GetPlottables().OfType<Scatter>(), s => s.LegendText == "instrument not traceable");

        var point = Assert.Single(ring.Data.GetScatterPoints());
        Assert.Equal(2023.2, point.X, 9);
        Assert.Equal(Math.Log10(14), point.Y, 9);
    }
}
