using ScottPlot;
using SkiaSharp;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// The marks drawn from a path (X, open triangle, diamonds, filled triangle), drawn from a path this code holds until
/// the draw returns. The plotting library's own versions build a path they never release, and the graphics binding
/// does not keep an argument alive through its native call: a garbage collection on any thread could then free the
/// path in the middle of the draw and crash the process (the test that collects non-stop while charts render showed
/// it every run). Same shapes and sizes as the library's.
/// </summary>
internal sealed class HeldPathMarker : IMarker
{
    private readonly MarkerShape _shape;

    private HeldPathMarker(MarkerShape shape) => _shape = shape;

    /// <summary>The held-path version of <paramref name="shape"/>; null for shapes drawn without a path (circles, squares).</summary>
    public static IMarker? For(MarkerShape shape) => shape switch
    {
        MarkerShape.Eks or MarkerShape.OpenTriangleUp or MarkerShape.OpenDiamond or MarkerShape.FilledDiamond or MarkerShape.FilledTriangleUp
            => new HeldPathMarker(shape),
        _ => null,
    };

    /// <summary>Sets the held-path version of the style's shape, where it has one.</summary>
    public static void Apply(MarkerStyle style)
    {
        style.CustomRenderer = For(style.Shape);
    }

    public void Render(SKCanvas canvas, Paint paint, Pixel center, float size, MarkerStyle markerStyle)
    {
        using var path = new SKPath();
        var radius = size / 2;
        switch (_shape)
        {
            case MarkerShape.Eks:
                path.MoveTo(center.X + radius, center.Y + radius);
                path.LineTo(center.X - radius, center.Y - radius);
                path.MoveTo(center.X - radius, center.Y + radius);
                path.LineTo(center.X + radius, center.Y - radius);
                Drawing.DrawPath(canvas, paint, path, markerStyle.LineStyle);
                break;
            case MarkerShape.OpenDiamond or MarkerShape.FilledDiamond:
                path.AddPoly([new(center.X + radius, center.Y), new(center.X, center.Y + radius), new(center.X - radius, center.Y), new(center.X, center.Y - radius)]);
                Draw(canvas, paint, path, markerStyle, new PixelRect(center, radius));
                break;
            default:
                // An equilateral triangle with sides of the mark's size, point up.
                var r = size / 1.732f;
                var (dx, dy) = (r * 0.866f, r / 2);
                path.AddPoly([new(center.X, center.Y - r), new(center.X + dx, center.Y + dy), new(center.X - dx, center.Y + dy)]);
                Draw(canvas, paint, path, markerStyle, new PixelRect(center, r));
                break;
        }

        // The path is released only here, after every native draw that reads it has returned.
        GC.KeepAlive(path);
    }

    private void Draw(SKCanvas canvas, Paint paint, SKPath path, MarkerStyle style, PixelRect rect)
    {
        if (_shape is MarkerShape.FilledDiamond or MarkerShape.FilledTriangleUp)
        {
            Drawing.FillPath(canvas, paint, path, style.FillStyle, rect);
            Drawing.DrawPath(canvas, paint, path, style.OutlineStyle);
        }
        else
        {
            Drawing.DrawPath(canvas, paint, path, style.LineStyle);
        }
    }
}
