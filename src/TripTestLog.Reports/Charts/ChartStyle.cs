using System.Globalization;
using System.Text;
using ScottPlot;
using SkiaSharp;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// The charts' own look: a pale band, dark edges, and marks that differ by shape as well as colour, so a black-and-white
/// print still tells a failure from a pass.
/// </summary>
internal static class ChartStyle
{
    public static readonly Color Band = Color.FromHex("#d9e6d3");
    public static readonly Color Edge = Color.FromHex("#2f4a2a");
    public static readonly Color WarmBand = Color.FromHex("#f2c894").WithAlpha(0.55);
    public static readonly Color WarmEdge = Color.FromHex("#8a4b08");
    public static readonly Color Pass = Color.FromHex("#1d4e89");
    public static readonly Color Fail = Color.FromHex("#a4161a");
    public static readonly Color Doubt = Color.FromHex("#6c6c6c");
    public static readonly Color Limit = Color.FromHex("#a4161a");
    public static readonly Color Trend = Color.FromHex("#b5651d");

    public const int Width = 760;
    public const int Height = 460;

    /// <summary>The marker of each kind of test mark.</summary>
    public static (MarkerShape Shape, Color Color, float Size) Marker(MarkKind kind) => kind switch
    {
        MarkKind.Failed => (MarkerShape.Eks, Fail, 14),
        MarkKind.NotAssessable => (MarkerShape.OpenTriangleUp, Doubt, 10),
        MarkKind.Held => (MarkerShape.OpenSquare, Pass, 9),
        MarkKind.PassBand => (MarkerShape.OpenCircle, Pass, 9),
        _ => (MarkerShape.FilledCircle, Pass, 8),
    };

    /// <summary>Adds one kind of test mark at (<paramref name="xs"/>, <paramref name="ys"/>), in its shape, colour and legend.</summary>
    public static void AddMarks(Plot plot, MarkKind kind, double[] xs, double[] ys)
    {
        var (shape, color, size) = Marker(kind);
        var points = plot.Add.ScatterPoints(xs, ys);
        points.MarkerShape = shape;
        HeldPathMarker.Apply(points.MarkerStyle);
        points.MarkerSize = size;
        points.MarkerLineWidth = kind == MarkKind.Failed ? 3 : 1.5f;
        points.Color = color;
        points.LegendText = TimeCurrentChart.Legend(kind);
    }

    /// <summary>
    /// Rings each reading taken with an instrument not traceable on the day with a large open diamond, over whatever mark
    /// the reading already has, so the mark survives a black-and-white print.
    /// </summary>
    public static void AddUntraceable(Plot plot, IReadOnlyList<(double X, double Y)> points)
    {
        if (points.Count == 0)
        {
            return;
        }

        var rings = plot.Add.ScatterPoints(points.Select(p => p.X).ToArray(), points.Select(p => p.Y).ToArray());
        rings.MarkerShape = MarkerShape.OpenDiamond;
        HeldPathMarker.Apply(rings.MarkerStyle);
        rings.MarkerSize = 18;
        rings.MarkerLineWidth = 1.5f;
        rings.Color = Trend;
        rings.LegendText = "instrument not traceable";
    }

    /// <summary>A plot with the shipped font and a white background.</summary>
    public static Plot NewPlot()
    {
        var plot = new Plot();
        ChartFont.Apply(plot);
        return plot;
    }

    /// <summary>The chart as SVG markup, ready to inline in a page (without the XML declaration, which HTML does not take).</summary>
    public static string Svg(Plot plot, int width = Width, int height = Height) => AppendSvg(new StringBuilder(), plot, width, height).ToString();

    /// <summary>
    /// Appends the chart as SVG markup to <paramref name="html"/>: the markup is decoded once and copied once, into the
    /// page, where each step of making it used to copy it again (about 3 MB of short-lived strings a device page).
    /// </summary>
    public static StringBuilder AppendSvg(StringBuilder html, Plot plot, int width = Width, int height = Height)
    {
        ArgumentNullException.ThrowIfNull(html);

        // Charts render on several threads at once (device pages are written in parallel): each plot is its own, and
        // the marks drawn from a path hold it until the native draw returns (HeldPathMarker).
        var svg = SvgOf(plot, width, height);
        var area = plot.RenderManager.LastRender.DataRect;
        var start = Math.Max(0, svg.IndexOf("<svg", StringComparison.Ordinal));

        // A view box lets the page scale the chart down (print, a narrow screen) instead of cropping it.
        html.Append("<svg");
        if (svg.IndexOf("viewBox", start, StringComparison.Ordinal) < 0)
        {
            html.Append(CultureInfo.InvariantCulture, $" viewBox=\"0 0 {width} {height}\"");
        }

        // The data area, in the SVG's own units, so a page test can check that no legend or label covers the data.
        html.Append(" data-plot-area=\"");
        html.AppendJoin(' ', area.Left.ToString("0.#", CultureInfo.InvariantCulture), area.Top.ToString("0.#", CultureInfo.InvariantCulture),
            area.Width.ToString("0.#", CultureInfo.InvariantCulture), area.Height.ToString("0.#", CultureInfo.InvariantCulture));
        html.Append('"');
        return ClipIds.AppendSteady(html, svg, start, skip: 4);
    }

    // The plot library's own SVG export draws every chart twice: once to a bitmap, to lay it out, then to the SVG
    // canvas. Laying it out on a canvas that draws nothing gives the same layout (the text is measured by the font, not
    // the canvas) without rasterising a bitmap that is thrown away, which was half of each chart's time. The layout pass
    // also skips the steps that only draw (below).
    private static string SvgOf(Plot plot, int width, int height)
    {
        var actions = plot.RenderManager.RenderActions;
        var all = actions.ToArray();
        actions.RemoveAll(DrawsOnly);
        try
        {
            using var layout = new SKNoDrawCanvas(width, height);
            plot.Render(layout, width, height);
        }
        finally
        {
            actions.Clear();
            actions.AddRange(all);
        }

        using var stream = new MemoryStream();
        var clears = plot.RenderManager.ClearCanvasBeforeEachRender;
        plot.RenderManager.ClearCanvasBeforeEachRender = false;
        try
        {
            using var canvas = SKSvgCanvas.Create(new SKRect(0, 0, width, height), stream);
            plot.Render(canvas, width, height);
        }
        finally
        {
            plot.RenderManager.ClearCanvasBeforeEachRender = clears;
        }

        return Encoding.UTF8.GetString(stream.GetBuffer(), 0, (int)stream.Length);
    }

    // The render steps that only draw: the backgrounds, the grids and the marks (what they set, the data area of each
    // mark's axes, the SVG render sets again before it reads it). The legends and the panels stay: a legend outside
    // the data area is sized as it is drawn, and moves the layout.
    private static bool DrawsOnly(IRenderAction action) => action is ScottPlot.Rendering.RenderActions.RenderFigureBackground
        or ScottPlot.Rendering.RenderActions.RenderDataBackground or ScottPlot.Rendering.RenderActions.RenderGridsBelowPlottables
        or ScottPlot.Rendering.RenderActions.RenderPlottables or ScottPlot.Rendering.RenderActions.RenderGridsAbovePlottables
        or ScottPlot.Rendering.RenderActions.RenderPlottablesLast;
}

/// <summary>How a test is marked on a chart.</summary>
internal enum MarkKind
{
    /// <summary>Passed at a standard's own point (filled circle).</summary>
    PassNormative,

    /// <summary>Passed on the band between points (open circle).</summary>
    PassBand,

    /// <summary>Held without tripping for the time shown (open square).</summary>
    Held,

    /// <summary>Too early or too late (a bold X).</summary>
    Failed,

    /// <summary>Not assessable (open triangle).</summary>
    NotAssessable,
}
