using ScottPlot;
using ScottPlot.Plottables;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Reports.Charts;

namespace TripTestLog.Reports.Tests;

/// <summary>The charts as rendered: each band for the tests' own start, log axes labelled as read, drift to scale.</summary>
public sealed class ChartTruthTests
{
    [Fact]
    public void AFailingWarmTest_IsDrawnAgainstTheWarmBand_AndFallsOutsideIt()
    {
        // IEC 60898-1 Table 7 b: at 1.45 In, from warm (straight after row a), a trip within 1 h. From cold there is no
        // upper limit at 1.45 In, so against the cold band alone this late trip would look like a pass.
        // (Its verdict needs the hold before it, which the warm-start checks cover; the chart draws a warm test's band either way.)
        var late = Charts.Trip(1.45 * 16, 3900, start: StartCondition.Warm);

        var svg = TimeCurrentChart.Svg(late.Envelope, [late]);
        var text = Charts.SvgText(svg);

        Assert.Contains("allowed band, warm start (guaranteed)", text);
        Assert.Contains("allowed band, cold start (guaranteed)", text);
        var warm = TimeCurrentChart.Band(late.Envelope, 20, new TestConditions(StartCondition.Warm, PoleLoading.AllPoles));
        var at = Array.FindIndex(warm.Multiples, m => m >= 1.45);
        Assert.Equal(3600, warm.Maximum[at], 6);
        Assert.True(3900 > warm.Maximum[at]);
    }

    [Fact]
    public void AColdOnlyChart_DrawsOneBand_AndNamesNoStart()
    {
        var svg = TimeCurrentChart.Svg(Charts.Envelope, [Charts.Trip(40.9, 22.5)]);

        var text = Charts.SvgText(svg);

        Assert.Contains("allowed band (guaranteed)", text);
        Assert.DoesNotContain(text, t => t.Contains("warm", StringComparison.Ordinal));
    }

    [Fact]
    public void TheTimeCurrentAxes_AreLabelled125_InMultiplesAndInAmperes()
    {
        // A C16 (In = 16 A): 2x is 32 A, 3x is 48 A, 5x is 80 A, 10x is 160 A (arithmetic on the rating).
        var svg = TimeCurrentChart.Svg(Charts.Envelope, [Charts.Trip(40.9, 22.5)]);

        var text = Charts.SvgText(svg);

        foreach (var label in new[] { "1x", "2x", "3x", "5x", "10x", "20x", "16 A", "32 A", "48 A", "80 A", "160 A", "320 A", "current, amperes" })
        {
            Assert.True(text.Contains(label), label + " is not among " + string.Join("|", text));
        }
    }

    [Fact]
    public void ADriftInsideTheBand_FillsTheChart_NotASliver()
    {
        // IEC 60898-1 Table 7 c: at 2.55 In the band is 1 s < t < 60 s. A climb from 25 s to 52 s is drawn on a time axis
        // scaled to that band (a tenth of the span as padding either side), so it spans about 15 % of the chart's height, where
        // a fixed 10 ms to 100 s axis gave it 8 % (log10(52 / 25) / 4 decades).
        DriftChart.Point[] tests = [new(2021.2, 25, MarkKind.PassNormative), new(2023.2, 38, MarkKind.PassNormative), new(2025.2, 52, MarkKind.PassNormative)];
        var plot = DriftChart.Build("2.55 In", tests, 1, 60, null);

        var svg = ChartStyle.Svg(plot, 400, 260);
        var area = plot.RenderManager.LastRender.DataRect;
        var from = plot.GetPixel(new Coordinates(2021.2, Math.Log10(25)));
        var to = plot.GetPixel(new Coordinates(2025.2, Math.Log10(52)));

        Assert.Contains("data-plot-area", svg);
        Assert.True((from.Y - to.Y) / area.Height > 0.14, $"the drift spans {(from.Y - to.Y) / area.Height:P0} of the chart's height");
        var (bottom, top) = DriftChart.Limits([25, 52], 1, 60, []);
        Assert.Equal(0 - 0.1 * Math.Log10(60), bottom, 9);
        Assert.Equal(Math.Log10(60) * 1.1, top, 9);
    }
}
