using ScottPlot;
using ScottPlot.Plottables;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Reports.Charts;

namespace TripTestLog.Reports.Tests;

/// <summary>The time-current chart draws the envelope's own edges and marks each test by its verdict.</summary>
public sealed class TimeCurrentChartTests
{
    [Theory]
    // IEC 60898-1 Table 7 for a C16 from cold, all poles: at 2.55 In, 1 s < t < 60 s (row c); at 10 In (curve C's
    // upper magnetic point, row e), a trip within 0.1 s; between the points the band is carried as the standard allows.
    [InlineData(2.56)]
    [InlineData(3.0)]
    [InlineData(7.0)]
    [InlineData(10.5)]
    public void ThePlottedEdges_AreTheEnvelopesOwnValues(double multiple)
    {
        var envelope = Charts.Envelope;
        var band = TimeCurrentChart.Band(envelope, 20);
        var plot = TimeCurrentChart.Build(envelope, band, []);
        var expected = envelope.At(CurrentMultiple.Of(multiple) * envelope.Reference).For(TestConditions.Reference);

        var earliest = Points(plot, "earliest allowed");
        var latest = Points(plot, "latest allowed");
        var i = Array.FindIndex(band.Multiples, m => m >= multiple);

        // The chart samples the band on a log grid: compare at the grid point just at or above the multiple.
        var atGrid = envelope.At(CurrentMultiple.Of(band.Multiples[i]) * envelope.Reference).For(TestConditions.Reference);
        Assert.Equal(Math.Log10(Math.Clamp(atGrid.Minimum.Limit!.Value.Value, 1e-3, 3e4)), earliest[i].Y, 9);
        Assert.Equal(Math.Log10(atGrid.Maximum.Limit is { } max ? Math.Clamp(max.Value, 1e-3, 3e4) : 3e4), latest[i].Y, 9);
        Assert.Equal(Math.Log10(band.Multiples[i]), earliest[i].X, 12);
        Assert.True(expected.HasRequirement);
    }

    [Fact]
    public void Row_c_IsDrawnAt1And60Seconds()
    {
        // IEC 60898-1 Table 7 c: 2.55 In, 1 s < t < 60 s (In <= 32 A). Just below 2.55 In the 1 s minimum holds (carried down).
        var envelope = Charts.Envelope;
        var band = TimeCurrentChart.Band(envelope, 20);
        var below = Array.FindLastIndex(band.Multiples, m => m < 2.55);

        Assert.Equal(1.0, band.Minimum[below], 4); // just below 2.55 In the carried I²t edge is 1 s x (2.55 / M)², a hair over 1 s
        Assert.Equal(60.0, band.Maximum[Array.FindIndex(band.Multiples, m => m > 2.55)], 9);
    }

    [Fact]
    public void AFailedTest_IsDrawnAsABoldX_ApartFromThePasses()
    {
        // C16 at 2.556 In: 75 s is past row c's 60 s (too late); 22.5 s passes.
        var late = Charts.Trip(40.9, 75);
        var pass = Charts.Trip(40.9, 22.5, line: 3);
        Assert.Equal(Verdict.TooLate, late.Assessment.Verdict);

        var marks = TimeCurrentChart.Marks([late, pass]);
        var plot = TimeCurrentChart.Build(late.Envelope, TimeCurrentChart.Band(late.Envelope, 20), marks);

        var failed = plot.GetPlottables().OfType<Scatter>().Single(s => s.LegendText == "too early or too late");
        Assert.Equal(MarkerShape.Eks, failed.MarkerShape);
        Assert.True(failed.MarkerLineWidth >= 3);
        var point = Assert.Single(failed.Data.GetScatterPoints());
        Assert.Equal((Math.Log10(40.9 / 16), Math.Log10(75)), (point.X, point.Y));
        var passes = plot.GetPlottables().OfType<Scatter>().Single(s => s.LegendText == "pass (standard's point)");
        Assert.NotEqual(MarkerShape.Eks, passes.MarkerShape);
    }

    [Fact]
    public void TheSvg_KeepsItsTextInTheShippedFont()
    {
        var svg = TimeCurrentChart.Svg(Charts.Envelope, [Charts.Trip(40.9, 22.5)]);

        var text = Charts.SvgText(svg);

        Assert.StartsWith("<svg", svg);
        Assert.Contains("trip time", text);
        Assert.Contains("current, multiple of In (16 A)", text);
        Assert.Contains("10 s", text);
        Assert.Contains("100 ms", text);
        Assert.Contains("font-family=\"DejaVu Sans\"", svg);
    }

    private static IReadOnlyList<Coordinates> Points(Plot plot, string legend) =>
        plot.GetPlottables().OfType<Scatter>().Single(s => s.LegendText == legend).Data.GetScatterPoints();
}
