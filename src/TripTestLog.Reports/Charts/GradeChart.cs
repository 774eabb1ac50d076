using ScottPlot;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;

namespace TripTestLog.Reports.Charts;

/// <summary>Devices per condition grade, as labelled bars.</summary>
internal static class GradeChart
{
    // One colour per grade in enum order; untested is a neutral grey, since its condition is unknown.
    private static readonly Color[] Colors =
    [
        Color.FromHex("#4f772d"), Color.FromHex("#90a955"), Color.FromHex("#e9c46a"), Color.FromHex("#8d99ae"), Color.FromHex("#e76f51"), Color.FromHex("#a4161a"),
    ];

    public static Plot Build(IReadOnlyList<int> byGrade)
    {
        var plot = ChartStyle.NewPlot();
        var grades = Enum.GetValues<ConditionGrade>();
        var bars = grades.Select((g, i) => new Bar
        {
            Position = i,
            Value = byGrade[i],
            FillColor = Colors[i],
            Label = byGrade[i].ToString(System.Globalization.CultureInfo.InvariantCulture),
        }).ToList();
        var plottable = plot.Add.Bars(bars);
        plottable.ValueLabelStyle.FontSize = 14;
        plot.Axes.Bottom.TickGenerator = new ScottPlot.TickGenerators.NumericManual(
            [.. grades.Select((g, i) => (double)i)], [.. grades.Select(g => TextCodes.Grade.Of(g))]);
        plot.Axes.Margins(bottom: 0, top: 0.15);
        plot.YLabel("devices");
        return plot;
    }
}
