using System.Globalization;
using ScottPlot;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// Log axes for ScottPlot, which has none: values are plotted as log10 and the axis labels the decades as 10^v with
/// log-spaced minor ticks.
/// </summary>
internal static class LogAxes
{
    public static void Apply(IAxis axis, Func<double, string> label)
    {
        axis.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
        {
            MinorTickGenerator = new ScottPlot.TickGenerators.LogMinorTickGenerator(),
            IntegerTicksOnly = true,
            LabelFormatter = label,
        };
    }

    /// <summary>A time decade as people write it: 1 ms, 10 ms, 100 ms, 1 s, 10 s, 100 s, 1000 s.</summary>
    public static string Seconds(double log10)
    {
        var s = Math.Pow(10, log10);
        return s < 1 ? (s * 1000).ToString("0.###", CultureInfo.InvariantCulture) + " ms" : s.ToString("0.###", CultureInfo.InvariantCulture) + " s";
    }

    /// <summary>A current multiple decade: 1x, 10x, 100x.</summary>
    public static string Multiple(double log10) => Math.Pow(10, log10).ToString("0.###", CultureInfo.InvariantCulture) + "x";
}
