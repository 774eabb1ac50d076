using TripTestLog.Application.Findings;
using TripTestLog.Application.Reports;
using TripTestLog.Domain.Devices;
using static TripTestLog.Application.Tests.Records;

namespace TripTestLog.Application.Tests;

/// <summary>
/// The report pipeline's selection and failure rules (docs/reports.md; the tool's own choices, no outside source), fed
/// typed records through an in-memory source and collected by a plain list.
/// </summary>
public sealed class ReportPipelineTests
{
    private static readonly DateOnly AsOf = new(2026, 12, 1);

    private static MemorySource Fleet() => new(
        Device(Breaker("A-01") with { Site = "North" }, trips:
        [
            TrippedAfter("A-01", "2025-03-18T12:00", 40.9, 20, 30, line: 2),
            TrippedAfter("A-01", "2026-03-18T12:00", 40.9, 20, 30, line: 3),
        ]),
        Device(Breaker("B-01") with { Site = "South" }, trips: [TrippedAfter("B-01", "2026-03-18T12:00", 40.9, 20, 30)]),
        Device(Breaker("C-01") with { Site = "north" }));

    [Fact]
    public async Task ASiteSelection_KeepsThatSitesDevices_WhateverTheCase_InTagOrder_AndStepsThroughEveryDevice()
    {
        var sink = new Collected();
        var steps = new List<string>();

        await ReportPipeline.RunAsync(Fleet(), FindingPolicy.Default, AsOf, ReportSelection.All with { Site = "NORTH" }, sink, steps.Add, CancellationToken.None);

        Assert.Equal(["A-01", "C-01"], sink.Devices.Select(d => d.Condition.Device.Tag.Value));
        Assert.Equal(["A-01", "B-01", "C-01"], steps);
    }

    [Fact]
    public async Task APeriod_CutsTheTripsShown_ButNotTheDevices()
    {
        var sink = new Collected();

        await ReportPipeline.RunAsync(Fleet(), FindingPolicy.Default, AsOf, ReportSelection.All with { From = new DateOnly(2026, 1, 1) }, sink, null,
            CancellationToken.None);

        var a = sink.Devices.Single(d => d.Condition.Device.Tag == AssetTag.Of("A-01"));
        Assert.Equal([3L], a.Trips.Select(t => t.Trip.SourceLine));
        Assert.Equal(3, sink.Devices.Count);
    }

    [Fact]
    public async Task AFailingSink_StopsTheRun_WithItsOwnFailure()
    {
        var sink = new Collected { FailOn = 2 };

        var failure = await Record.ExceptionAsync(() =>
            ReportPipeline.RunAsync(Fleet(), FindingPolicy.Default, AsOf, ReportSelection.All, sink, null, CancellationToken.None));

        Assert.IsType<IOException>(failure);
        Assert.Single(sink.Devices);
    }

    private sealed class Collected : IDeviceReportSink
    {
        public List<DeviceReport> Devices { get; } = [];

        public int FailOn { get; init; }

        public void Add(DeviceReport device)
        {
            if (Devices.Count + 1 == FailOn)
            {
                throw new IOException("No space left on device");
            }

            Devices.Add(device);
        }
    }
}
