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
    internal sealed record Point(double Year, double Seconds, MarkKind Kind);

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

        if (exit?.Trend is { } trend && exit.ForecastOn is { } date)
        {
            var end = TrendPoint.YearOf(date);
            double[] xs = [first, end];
            double[] ys = [trend.At(first), trend.At(end)];
            Dashes.Add(plot, xs, ys, ChartStyle.Trend, 2, $"trend (Theil–Sen), leaves the band about {date:yyyy-MM}");
        }

        LogAxes.Apply(plot.Axes.Left, LogAxes.Seconds);
        YearAxis.Apply(plot, first, last);
        var values = tests.Select(t => Math.Log10(t.Seconds)).Concat(new[] { minimumSeconds, maximumSeconds }.Where(v => v is > 0).Select(v => Math.Log10(v!.Value))).ToList();
        plot.Axes.SetLimitsY(Math.Floor(values.Min() - 0.1), Math.Ceiling(values.Max() + 0.1));
        plot.Title(title);
        plot.YLabel("trip time");
        plot.ShowLegend(Alignment.LowerRight);
        return plot;
    }
}
