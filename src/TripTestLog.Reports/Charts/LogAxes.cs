using System.Globalization;
using ScottPlot;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// Log axes for ScottPlot, which has none: values are plotted as log10, and the axis labels the values people read off
/// a log scale (1, 2, 3, 5, 10, 20, 50 ...) as densely as the axis has room for, with minor ticks at the other integers.
/// </summary>
internal static class LogAxes
{
    public static void Apply(IAxis axis, Func<double, string> label) => axis.TickGenerator = new LogTicks(label);

    /// <summary>A time as people write it: 1 ms, 20 ms, 500 ms, 1 s, 30 s, 1000 s.</summary>
    public static string Seconds(double log10)
    {
        var s = Math.Pow(10, log10);
        return s < 1 ? Round(s * 1000) + " ms" : Round(s) + " s";
    }

    /// <summary>A current multiple: 1x, 2x, 5x, 10x.</summary>
    public static string Multiple(double log10) => Round(Math.Pow(10, log10)) + "x";

    /// <summary>A current in amperes for a multiple of <paramref name="reference"/> amperes: 16 A, 32 A, 160 A, 1.6 kA.</summary>
    public static Func<double, string> Amperes(double reference) => log10 =>
    {
        var a = Math.Pow(10, log10) * reference;
        return a >= 10_000 ? Round(a / 1000) + " kA" : Round(a) + " A";
    };

    // Three significant digits at most: the label names a tick, not a measurement.
    private static string Round(double value) =>
        double.Parse(value.ToString("G3", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture).ToString("0.###", CultureInfo.InvariantCulture);

    /// <summary>Major ticks at 1, 2, 3, 5 (or 1, 2, 5, or 1) of each decade, by the room per decade; minor ticks at the rest.</summary>
    internal sealed class LogTicks(Func<double, string> label) : ITickGenerator
    {
        /// <summary>The labels of a decade from dense to sparse, and the pixels a decade needs for each.</summary>
        private static readonly (int[] Mantissas, float PixelsPerDecade)[] Steps = [([1, 2, 3, 5], 110), ([1, 2, 5], 60), ([1], 0)];

        public Tick[] Ticks { get; set; } = [];

        public int MaxTickCount { get; set; } = 10_000;

        public void Regenerate(CoordinateRange range, Edge edge, PixelLength size, Paint paint, LabelStyle labelStyle)
        {
            var low = Math.Min(range.Min, range.Max);
            var high = Math.Max(range.Min, range.Max);
            var decades = Math.Max(high - low, 1e-9);
            var perDecade = size.Length / decades;
            var mantissas = Steps.First(s => perDecade >= s.PixelsPerDecade).Mantissas;
            var ticks = new List<Tick>();
            for (var d = (int)Math.Floor(low); d <= (int)Math.Ceiling(high); d++)
            {
                for (var m = 1; m <= 9; m++)
                {
                    var at = d + Math.Log10(m);
                    if (at < low - 1e-6 || at > high + 1e-6)
                    {
                        continue;
                    }

                    ticks.Add(mantissas.Contains(m) ? Tick.Major(at, label(at)) : Tick.Minor(at));
                }
            }

            Ticks = [.. ticks];
        }
    }
}
