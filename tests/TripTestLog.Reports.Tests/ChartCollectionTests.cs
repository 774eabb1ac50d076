using TripTestLog.Application.Findings;
using TripTestLog.Domain.Measurements;
using TripTestLog.Reports.Charts;

namespace TripTestLog.Reports.Tests;

/// <summary>
/// Charts drawn while the garbage collector runs all the time on another thread. The marks drawn from a path (the X of
/// a failure, the triangle of a test that proves nothing, the diamonds) must survive a collection in the middle of
/// their native draw: a freed path there crashes the whole process, with no exception to catch.
/// </summary>
public sealed partial class ChartCollectionTests
{
    [Fact]
    public void ChartsFullOfPathMarks_RenderWhileTheCollectorRunsNonStop()
    {
        // Every kind of mark, many of each, on the drift chart (log time axis) and the contact chart.
        DriftChart.Point[] tests = [.. Enumerable.Range(0, 60).Select(i => new DriftChart.Point(2000 + i / 4.0, 10 + i % 7,
            (MarkKind)(i % 5), Traceable: i % 3 != 0))];
        // Four poles: the contact chart's filled diamond and triangle marks too, one reading in three untraceable.
        PoleReading[] readings = [.. Enumerable.Range(0, 40).Select(i => new PoleReading((1 + i % 4).ToString(System.Globalization.CultureInfo.InvariantCulture),
            new DateOnly(2000 + i / 4, 3, 1), TestStage.AsFound, 5000 + 10 * i, 5000 + 10 * i, true, 10, 1, i % 3 != 0))];
        using var stop = new CancellationTokenSource();
        var collector = new Thread(() =>
        {
            while (!stop.IsCancellationRequested)
            {
                GC.Collect();
                GC.WaitForPendingFinalizers();
            }
        }) { IsBackground = true };
        collector.Start();
        try
        {
            // Before the marks held their paths, this crashed the test host within the first few dozen charts, every run.
            for (var i = 0; i < 150; i++)
            {
                var svg = i % 15 == 0 ? ChartStyle.Svg(ContactChart.Build(readings, 8000, [])) : ChartStyle.Svg(DriftChart.Build("2.55 In cold", tests, 1, 60, null), 400, 260);
                Assert.EndsWith("</svg>", svg.TrimEnd(), StringComparison.Ordinal);
            }
        }
        finally
        {
            stop.Cancel();
            collector.Join();
        }
    }

    [Fact]
    public void ChartsRenderOnTwoThreadsAtOnce_WhileTheCollectorRunsNonStop()
    {
        DriftChart.Point[] tests = [.. Enumerable.Range(0, 60).Select(i => new DriftChart.Point(2000 + i / 4.0, 10 + i % 7,
            (MarkKind)(i % 5), Traceable: i % 3 != 0))];
        PoleReading[] readings = [.. Enumerable.Range(0, 40).Select(i => new PoleReading((1 + i % 4).ToString(System.Globalization.CultureInfo.InvariantCulture),
            new DateOnly(2000 + i / 4, 3, 1), TestStage.AsFound, 5000 + 10 * i, 5000 + 10 * i, true, 10, 1, i % 3 != 0))];
        using var stop = new CancellationTokenSource();
        var collector = new Thread(() =>
        {
            while (!stop.IsCancellationRequested)
            {
                GC.Collect();
                GC.WaitForPendingFinalizers();
            }
        }) { IsBackground = true };
        collector.Start();
        try
        {
            // As the report draws device pages: every core renders charts with text, marks and legends at once.
            var svgs = new System.Collections.Concurrent.ConcurrentBag<string>();
            Parallel.For(0, 300, new ParallelOptions { MaxDegreeOfParallelism = Math.Max(2, Environment.ProcessorCount) }, i =>
                svgs.Add(i % 3 == 0 ? ChartStyle.Svg(ContactChart.Build(readings, 8000, [])) : ChartStyle.Svg(DriftChart.Build($"{2 + i % 5}.55 In cold", tests, 1, 60, null), 400, 260)));
            Assert.Equal(300, svgs.Count);
            Assert.All(svgs, svg => Assert.EndsWith("</svg>", svg.TrimEnd(), StringComparison.Ordinal));

            // The same chart drawn alone and among others is the same drawing, clip ids and all: a report comes out the
            // same each run.
            var alone = ChartStyle.Svg(DriftChart.Build("2.55 In cold", tests, 1, 60, null), 400, 260);
            Assert.Contains(alone, svgs);

            // Two different drawings never share a clip id (a page inlines several charts).
            var drawings = svgs.Distinct().ToList();
            Assert.Equal(6, drawings.Count);
            var ids = drawings.SelectMany(svg => ClipId().Matches(svg).Select(m => m.Groups[1].Value).Distinct()).ToList();
            Assert.NotEmpty(ids);
            Assert.Equal(ids.Count, ids.Distinct().Count());
            Assert.All(drawings, svg => Assert.DoesNotContain("cl_", svg, StringComparison.Ordinal));
        }
        finally
        {
            stop.Cancel();
            collector.Join();
        }
    }

    [System.Text.RegularExpressions.GeneratedRegex("id=\"(k[0-9a-f]+_[0-9a-f]+)\"")]
    private static partial System.Text.RegularExpressions.Regex ClipId();
}
