using ScottPlot;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// Dashed lines drawn as short solid segments. SkiaSharp's SVG canvas ignores line patterns (and says so on the
/// console), so a dashed edge would come out solid in the SVG; segments keep it dashed on screen and in print.
/// </summary>
internal static class Dashes
{
    private const int Pieces = 48;

    /// <summary>Adds the polyline through (<paramref name="xs"/>, <paramref name="ys"/>) as dashes; NaN points break it.</summary>
    public static void Add(Plot plot, double[] xs, double[] ys, Color color, float width, string? legend)
    {
        var (px, py) = Densify(xs, ys);
        var labelled = false;
        for (var i = 0; i + 1 < px.Length; i++)
        {
            if ((i / 2) % 2 == 1 || double.IsNaN(py[i]) || double.IsNaN(py[i + 1]))
            {
                continue;
            }

            var segment = plot.Add.Line(px[i], py[i], px[i + 1], py[i + 1]);
            segment.Color = color;
            segment.LineWidth = width;
            if (legend is not null && !labelled)
            {
                segment.LegendText = legend;
                labelled = true;
            }
        }
    }

    // Enough points that the dashes are short whatever the spacing of the data.
    private static (double[] X, double[] Y) Densify(double[] xs, double[] ys)
    {
        if (xs.Length >= Pieces)
        {
            return (xs, ys);
        }

        var x = new List<double>();
        var y = new List<double>();
        for (var i = 0; i + 1 < xs.Length; i++)
        {
            var steps = Math.Max(1, Pieces / (xs.Length - 1));
            for (var s = 0; s < steps; s++)
            {
                var f = (double)s / steps;
                x.Add(xs[i] + (xs[i + 1] - xs[i]) * f);
                y.Add(ys[i] + (ys[i + 1] - ys[i]) * f);
            }
        }

        x.Add(xs[^1]);
        y.Add(ys[^1]);
        return ([.. x], [.. y]);
    }
}
