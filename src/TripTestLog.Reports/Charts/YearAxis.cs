using System.Globalization;
using ScottPlot;

namespace TripTestLog.Reports.Charts;

/// <summary>A time axis in fractional years, labelled with whole years.</summary>
internal static class YearAxis
{
    public static void Apply(Plot plot, double from, double to)
    {
        plot.Axes.Bottom.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic
        {
            IntegerTicksOnly = true,
            LabelFormatter = y => y.ToString("0", CultureInfo.InvariantCulture),
        };
        plot.Axes.SetLimitsX(Math.Floor(from) - 0.2, Math.Ceiling(to) + 0.2);
    }
}
