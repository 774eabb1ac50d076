using ScottPlot;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// One test point's as-found trip times over the years on a log time axis, with the guaranteed band edges at that point
/// and, when there is one, the trend line and the date it leaves the band.
/// </summary>
internal static class DriftChart
{
    /// <summary>One test on the chart.</summary>
    internal sealed record Point(double Year, double Seconds, MarkKind Kind, bool Traceable = true);

    public static Plot Build(string title, IReadOnlyList<Point> tests, double? minimumSeconds, double? maximumSeconds, Finding? exit)
    {
        var plot = ChartStyle.NewPlot();
        var first = tests.Min(t => t.Year);
        var last = Math.Max(tests.Max(t => t.Year), exit?.ForecastOn is { } on ? TrendPoint.YearOf(on) : 0);
        foreach (var (edge, name) in new[] { (minimumSeconds, "earliest allowed"), (maximumSeconds, "latest allowed") })
        {
            if (edge is > 0)
            {
                var line = plot.Add.HorizontalLine(Math.Log10(edge.Value));
                line.Color = ChartStyle.Edge;
                line.LineWidth = 2;
                line.LegendText = name;
            }
        }

        foreach (var group in tests.GroupBy(t => t.Kind).OrderBy(g => g.Key))
        {
            ChartStyle.AddMarks(plot, group.Key, [.. group.Select(t => t.Year)], [.. group.Select(t => Math.Log10(t.Seconds))]);
        }

        ChartStyle.AddUntraceable(plot, [.. tests.Where(t => !t.Traceable).Select(t => (t.Year, Math.Log10(t.Seconds)))]);

        if (exit?.Trend is { } trend && exit.ForecastOn is { } date)
        {
            var end = TrendPoint.YearOf(date);
            double[] xs = [first, end];
            double[] ys = [trend.At(first), trend.At(end)];
            Dashes.Add(plot, xs, ys, ChartStyle.Trend, 2, $"trend (Theil–Sen), leaves the band about {date:yyyy-MM}");
        }

        LogAxes.Apply(plot.Axes.Left, LogAxes.Seconds);
        YearAxis.Apply(plot, first, last);
        var (bottom, top) = Limits(tests.Select(t => t.Seconds), minimumSeconds, maximumSeconds, exit?.Trend is { } fitted ? [fitted.At(first)] : []);
        plot.Axes.SetLimitsY(bottom, top);
        plot.Title(title);
        plot.YLabel("trip time");
        plot.ShowLegend(Edge.Bottom);
        return plot;
    }

    /// <summary>
    /// The time axis limits (log10 seconds): the point's own band edges and every test and trend start, with a tenth of that
    /// span either side, so a drift inside the band fills the chart instead of a sliver of a fixed span of decades.
    /// </summary>
    public static (double Bottom, double Top) Limits(IEnumerable<double> seconds, double? minimumSeconds, double? maximumSeconds, IEnumerable<double> logSeconds)
    {
        var values = seconds.Where(s => s > 0).Select(Math.Log10)
            .Concat(new[] { minimumSeconds, maximumSeconds }.Where(v => v is > 0).Select(v => Math.Log10(v!.Value)))
            .Concat(logSeconds.Where(double.IsFinite))
            .ToList();
        var low = values.Min();
        var high = values.Max();
        var pad = Math.Max(high - low, 0.2) * 0.1;
        return (low - pad, high + pad);
    }
}
