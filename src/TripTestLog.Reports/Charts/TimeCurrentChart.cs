using System.Text;
using ScottPlot;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// The time-current chart of one device: log current (as a multiple of the setting) against log time, the guaranteed
/// band shaded between solid edges, the typical edges dashed, and every test marked by its verdict. The band is drawn
/// for a cold start with all poles loaded (the standards' reference conditions) and, when a warm test is shown, a second
/// band for a warm start, so a warm test is seen against the band it was judged by.
/// </summary>
internal static class TimeCurrentChart
{
    /// <summary>The lowest and highest times drawn: 1 ms to 30,000 s.</summary>
    public const double FloorSeconds = 1e-3, CeilingSeconds = 3e4;

    /// <summary>The band sampled for drawing: each edge in seconds, NaN where there is none.</summary>
    internal sealed record BandLines(double[] Multiples, double[] Minimum, double[] Maximum, double[] TypicalMinimum, double[] TypicalMaximum);

    /// <summary>A band in the colour and words of the start it is drawn for.</summary>
    private sealed record StartBand(StartCondition Start, Color Fill, Color Edge, string Name);

    /// <summary>A test on the chart.</summary>
    internal sealed record Mark(double Multiple, double Seconds, MarkKind Kind, string Label, StartCondition Start = StartCondition.Cold);

    /// <summary>The band at log-spaced multiples from 1 to <paramref name="upTo"/>, and just either side of each standard's point.</summary>
    public static BandLines Band(ITripEnvelope envelope, double upTo) => Band(envelope, upTo, TestConditions.Reference);

    /// <summary>The band under <paramref name="conditions"/> at log-spaced multiples from 1 to <paramref name="upTo"/>.</summary>
    public static BandLines Band(ITripEnvelope envelope, double upTo, TestConditions conditions)
    {
        var multiples = Enumerable.Range(0, 121).Select(i => Math.Pow(10, Math.Log10(upTo) * i / 120))
            .Concat(envelope.Points.SelectMany(p => new[] { p.Multiple.Value * 0.999999, p.Multiple.Value * 1.000001 }))
            .Where(m => m >= 1 && m <= upTo)
            .Distinct()
            .Order()
            .ToArray();
        var bands = multiples.Select(m => envelope.At(CurrentMultiple.Of(m) * envelope.Reference).For(conditions)).ToArray();
        return new BandLines(
            multiples,
            [.. bands.Select(b => b.HasRequirement ? Bottom(b.Minimum.Limit) : double.NaN)],
            [.. bands.Select(b => b.HasRequirement ? Top(b.Maximum.Limit) : double.NaN)],
            [.. bands.Select(b => b.TypicalMinimum is { } t ? Bottom(t.Limit) : double.NaN)],
            [.. bands.Select(b => b.TypicalMaximum is { } t ? Top(t.Limit) : double.NaN)]);
    }

    /// <summary>Each test as a mark: its current over the envelope's reference, its time, and how its verdict is drawn.</summary>
    public static IReadOnlyList<Mark> Marks(IEnumerable<JudgedTrip> trips) =>
        [.. trips.Select(t =>
        {
            var m = t.Trip.Measurement;
            return new Mark(m.Current.Value / t.Envelope.Reference.Value, Math.Clamp(m.Outcome.Time.Value, FloorSeconds, CeilingSeconds), KindOf(t),
                $"{m.TestedAt.Date:yyyy-MM-dd} {(m.Stage == TestStage.AsLeft ? "as-left" : "as-found")}", m.Start);
        })];

    /// <summary>How a judged test is marked: by its verdict, and for a pass by whether it rests on a standard's point.</summary>
    public static MarkKind KindOf(JudgedTrip trip)
    {
        ArgumentNullException.ThrowIfNull(trip);
        var a = trip.Assessment;
        return a.IsFailure ? MarkKind.Failed
            : a.Verdict == Verdict.NotAssessable ? MarkKind.NotAssessable
            : !trip.Trip.Measurement.Outcome.Tripped ? MarkKind.Held
            : a.Basis == VerdictBasis.Normative ? MarkKind.PassNormative
            : MarkKind.PassBand;
    }

    /// <summary>The chart as a ScottPlot plot (kept for tests to inspect), from the cold band and the marks.</summary>
    public static Plot Build(ITripEnvelope envelope, BandLines band, IReadOnlyList<Mark> marks) => Build(envelope, band, null, marks);

    /// <summary>The chart with the cold band and, when given, the warm band drawn beside it.</summary>
    public static Plot Build(ITripEnvelope envelope, BandLines cold, BandLines? warm, IReadOnlyList<Mark> marks)
    {
        var plot = ChartStyle.NewPlot();
        var xs = cold.Multiples.Select(Math.Log10).ToArray();
        var coldStyle = new StartBand(StartCondition.Cold, ChartStyle.Band, ChartStyle.Edge, warm is null ? "" : ", cold start");
        Shade(plot, cold, coldStyle);
        if (warm is not null)
        {
            Shade(plot, warm, new StartBand(StartCondition.Warm, ChartStyle.WarmBand, ChartStyle.WarmEdge, ", warm start"));
        }

        Line(plot, xs, [.. cold.TypicalMinimum.Select(Log)], ChartStyle.Edge, dashed: true, "typical edges" + coldStyle.Name + " (advisory only)");
        Line(plot, xs, [.. cold.TypicalMaximum.Select(Log)], ChartStyle.Edge, dashed: true, null);

        foreach (var group in marks.GroupBy(m => m.Kind).OrderBy(g => g.Key))
        {
            ChartStyle.AddMarks(plot, group.Key, [.. group.Select(m => Math.Log10(m.Multiple))], [.. group.Select(m => Math.Log10(m.Seconds))]);
        }

        LogAxes.Apply(plot.Axes.Bottom, LogAxes.Multiple);
        LogAxes.Apply(plot.Axes.Left, LogAxes.Seconds);
        LogAxes.Apply(plot.Axes.Top, LogAxes.Amperes(envelope.Reference.Value));
        plot.Axes.Top.MajorTickStyle.Length = plot.Axes.Bottom.MajorTickStyle.Length;
        plot.Axes.Top.MinorTickStyle.Length = plot.Axes.Bottom.MinorTickStyle.Length;
        plot.XLabel($"current, multiple of {envelope.ReferenceName} ({envelope.Reference})");
        plot.Axes.Top.Label.Text = "current, amperes";
        plot.Axes.Top.Label.FontSize = plot.Axes.Bottom.Label.FontSize;
        plot.Axes.Top.Label.Bold = plot.Axes.Bottom.Label.Bold;
        plot.YLabel("trip time");
        // A hair past the band's end, so the axis keeps the label at its last multiple (20x, say).
        var right = Math.Log10(cold.Multiples[^1]) + 0.03;
        plot.Axes.SetLimits(0, right, Math.Log10(FloorSeconds), Math.Log10(CeilingSeconds));
        plot.Axes.SetLimitsX(0, right, plot.Axes.Top);
        plot.ShowLegend(Edge.Right);
        return plot;
    }

    /// <summary>The chart of a device's envelope and tests as SVG: the warm band is drawn when a warm test is shown.</summary>
    public static string Svg(ITripEnvelope envelope, IReadOnlyList<JudgedTrip> trips) => AppendSvg(new StringBuilder(), envelope, trips).ToString();

    /// <summary>As <see cref="Svg"/>, appended to a page.</summary>
    public static StringBuilder AppendSvg(StringBuilder html, ITripEnvelope envelope, IReadOnlyList<JudgedTrip> trips)
    {
        var marks = Marks(trips);
        var upTo = Math.Max(20, marks.Count == 0 ? 0 : marks.Max(m => m.Multiple) * 1.5);
        var warm = marks.Any(m => m.Start == StartCondition.Warm)
            ? Band(envelope, upTo, new TestConditions(StartCondition.Warm, PoleLoading.AllPoles))
            : null;
        using var plot = Build(envelope, Band(envelope, upTo), warm, marks);
        return ChartStyle.AppendSvg(html, plot);
    }

    /// <summary>Whether the device's chart draws a warm band beside the cold one.</summary>
    public static bool DrawsWarmBand(IReadOnlyList<JudgedTrip> trips) => trips.Any(t => t.Trip.Measurement.Start == StartCondition.Warm);

    public static string Legend(MarkKind kind) => kind switch
    {
        MarkKind.Failed => "too early or too late",
        MarkKind.NotAssessable => "not assessable",
        MarkKind.Held => "held, no trip",
        MarkKind.PassBand => "pass (band between points)",
        _ => "pass (standard's point)",
    };

    private static void Shade(Plot plot, BandLines band, StartBand style)
    {
        var xs = band.Multiples.Select(Math.Log10).ToArray();
        var lower = band.Minimum.Select(Log).ToArray();
        var upper = band.Maximum.Select(Log).ToArray();
        var drawn = Enumerable.Range(0, xs.Length).Where(i => !double.IsNaN(lower[i]) && !double.IsNaN(upper[i])).ToArray();
        if (drawn.Length > 1)
        {
            var fill = plot.Add.FillY([.. drawn.Select(i => xs[i])], [.. drawn.Select(i => lower[i])], [.. drawn.Select(i => upper[i])]);
            fill.FillColor = style.Fill;
            fill.LineWidth = 0;
            fill.LegendText = "allowed band" + style.Name + " (guaranteed)";
        }

        // The warm edges are dashed as well as coloured, so a black-and-white print still tells the two bands apart.
        var warm = style.Start == StartCondition.Warm;
        Line(plot, xs, lower, style.Edge, dashed: warm, "earliest allowed" + style.Name);
        Line(plot, xs, upper, style.Edge, dashed: warm, "latest allowed" + style.Name);
    }

    private static void Line(Plot plot, double[] xs, double[] ys, Color color, bool dashed, string? legend)
    {
        if (ys.All(double.IsNaN))
        {
            return;
        }

        if (dashed)
        {
            Dashes.Add(plot, xs, ys, color, 1.5f, legend);
            return;
        }

        var line = plot.Add.Scatter(xs, ys);
        line.Color = color;
        line.LineWidth = 2;
        line.MarkerSize = 0;
        line.LegendText = legend ?? "";
    }

    private static double Bottom(Seconds? limit) => limit is { } l ? Math.Clamp(l.Value, FloorSeconds, CeilingSeconds) : double.NaN;

    private static double Top(Seconds? limit) => limit is { } l ? Math.Clamp(l.Value, FloorSeconds, CeilingSeconds) : CeilingSeconds;

    private static double Log(double seconds) => double.IsNaN(seconds) ? double.NaN : Math.Log10(seconds);
}
