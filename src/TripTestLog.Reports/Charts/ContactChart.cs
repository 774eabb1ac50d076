using ScottPlot;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// Contact resistance per pole over the years (referred to 20 °C), with the maker's limit, each pole's baseline (its
/// first as-found reading), and each forecast's Theil–Sen line running to the date it reaches the limit.
/// </summary>
internal static class ContactChart
{
    private static readonly Color[] Poles = [Color.FromHex("#1d4e89"), Color.FromHex("#4f772d"), Color.FromHex("#7b2cbf"), Color.FromHex("#3d405b")];
    private static readonly MarkerShape[] Shapes = [MarkerShape.FilledCircle, MarkerShape.FilledSquare, MarkerShape.FilledDiamond, MarkerShape.FilledTriangleUp];

    /// <summary>A forecast's line as drawn: from the first reading it rests on to the date it reaches the limit.</summary>
    public static (double X0, double Y0, double X1, double Y1) ForecastLine(Finding forecast, double fromYear)
    {
        var trend = forecast.Trend ?? throw new ArgumentException("a forecast finding carries its trend", nameof(forecast));
        var to = TrendPoint.YearOf(forecast.ForecastOn ?? throw new ArgumentException("a forecast finding carries its date", nameof(forecast)));
        return (fromYear, trend.At(fromYear), to, trend.At(to));
    }

    public static Plot Build(IReadOnlyList<PoleReading> readings, double? limitMicroOhms, IReadOnlyList<Finding> forecasts)
    {
        var plot = ChartStyle.NewPlot();
        var poles = readings.Select(r => r.Pole).Distinct().Order(StringComparer.Ordinal).ToList();
        foreach (var (pole, i) in poles.Select((p, i) => (p, i)))
        {
            var found = readings.Where(r => r.Pole == pole && r.Stage == TestStage.AsFound).ToList();
            var left = readings.Where(r => r.Pole == pole && r.Stage == TestStage.AsLeft).ToList();
            var color = Poles[i % Poles.Length];
            if (found.Count > 0)
            {
                double[] xs = [.. found.Select(r => TrendPoint.YearOf(r.Date))];
                double[] ys = [.. found.Select(r => r.CorrectedMicroOhms)];
                var series = plot.Add.Scatter(xs, ys);
                series.Color = color;
                series.MarkerShape = Shapes[i % Shapes.Length];
                HeldPathMarker.Apply(series.MarkerStyle);
                series.MarkerSize = 8;
                series.LineWidth = 1.5f;
                series.LegendText = $"pole {pole} as-found";
                var baselineStart = TrendPoint.YearOf(found[0].Date);
                var baselineEnd = TrendPoint.YearOf(readings.Max(r => r.Date));
                Dashes.Add(plot, [baselineStart, baselineEnd], [found[0].CorrectedMicroOhms, found[0].CorrectedMicroOhms], color.WithAlpha(0.6), 1, null);
            }

            if (left.Count > 0)
            {
                double[] xs = [.. left.Select(r => TrendPoint.YearOf(r.Date))];
                double[] ys = [.. left.Select(r => r.CorrectedMicroOhms)];
                var points = plot.Add.ScatterPoints(xs, ys);
                points.Color = color;
                points.MarkerShape = MarkerShape.OpenCircle;
                points.MarkerSize = 11;
                points.LegendText = $"pole {pole} as-left";
            }
        }

        ChartStyle.AddUntraceable(plot, [.. readings.Where(r => !r.Traceable).Select(r => (TrendPoint.YearOf(r.Date), r.CorrectedMicroOhms))]);
        if (limitMicroOhms is { } limit)
        {
            var line = plot.Add.HorizontalLine(limit);
            line.Color = ChartStyle.Limit;
            line.LineWidth = 2;
            line.LegendText = "maker's limit";
        }

        var first = readings.Min(r => TrendPoint.YearOf(r.Date));
        var last = readings.Max(r => TrendPoint.YearOf(r.Date));
        foreach (var forecast in forecasts.Where(f => f.Trend is not null && f.ForecastOn is not null))
        {
            var from = readings.Where(r => r.Pole == forecast.Pole).Select(r => TrendPoint.YearOf(r.Date)).DefaultIfEmpty(first).Min();
            var (x0, y0, x1, y1) = ForecastLine(forecast, from);
            double[] xs = [x0, x1];
            double[] ys = [y0, y1];
            Dashes.Add(plot, xs, ys, ChartStyle.Trend, 2, $"pole {forecast.Pole} trend, reaches the limit about {forecast.ForecastOn:yyyy-MM}");
            last = Math.Max(last, x1);
        }

        YearAxis.Apply(plot, first, last);
        plot.YLabel("contact resistance at 20 °C, µΩ");
        plot.Axes.SetLimitsY(0, Math.Max(readings.Max(r => r.CorrectedMicroOhms), limitMicroOhms ?? 0) * 1.15);
        plot.ShowLegend(Edge.Right);
        return plot;
    }
}
