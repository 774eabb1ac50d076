using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Settings;
using static TripTestLog.Application.Tests.Records;

namespace TripTestLog.Application.Tests;

/// <summary>
/// Check and findings read, judge and hand over on three threads: what comes out is what one thread judging device by
/// device gives, in the same order; a failure while reading reaches the caller as itself; a cancelled run stops. The
/// tool's own pipeline rules (docs/scale.md), no outside source.
/// </summary>
public sealed class StagedPipelineTests
{
    private static readonly DateOnly AsOf = new(2026, 12, 1);

    // Forty breakers, each with a test near IEC 60898-1 Table 7 row c (2.55 In, 1 s < t < 60 s) that passes and, on every
    // fifth, one at 5 In (row d, no trip within 0.1 s) that trips too early.
    private static MemorySource Fleet() => new([.. Enumerable.Range(0, 40).Select(i =>
    {
        var tag = $"B-{i:00}";
        List<StoredTrip> trips =
        [
            TrippedAfter(tag, "2025-03-18T12:00", 16 * 2.55 * (1 + (i % 5 * 0.004)), 10 + i, 20 + (i % 7), line: 2 + i),
            TrippedAfter(tag, "2026-03-18T12:00", 16 * 2.55, 12 + i, 24, line: 100 + i),
        ];
        if (i % 5 == 0)
        {
            trips.Add(TrippedAfter(tag, "2026-04-01T09:00", 80, 0.02, 20, line: 200 + i));
        }

        return Device(Breaker(tag), trips);
    })]);

    [Fact]
    public void TheStagedCheck_GivesWhatOneThreadJudgingDeviceByDeviceGives_InTheSameOrder()
    {
        var source = Fleet();
        var judge = DeviceJudge.For(source, requireRegisteredInstruments: false);
        var oneThread = source.Devices().SelectMany(judge.Judge).Select(Line).ToList();

        var staged = CheckPipeline.Run(source).Select(Line).ToList();

        Assert.Equal(88, staged.Count);
        Assert.Equal(oneThread, staged);
        Assert.Contains(staged, l => l.Contains("TooEarly", StringComparison.Ordinal));
    }

    [Fact]
    public void TheStagedFindings_GiveEveryDevicesCondition_InTagOrder_WithItsJudgedTests()
    {
        var reports = FindingsPipeline.RunWithRecords(Fleet(), FindingPolicy.Default, AsOf).ToList();

        Assert.Equal(Enumerable.Range(0, 40).Select(i => $"B-{i:00}"), reports.Select(r => r.Condition.Device.Tag.Value));
        Assert.All(reports, r => Assert.Equal(r.Records.Trips.Select(t => t.SourceLine), r.Trips.Select(t => t.Trip.SourceLine)));
        Assert.Equal(8, reports.Count(r => r.Trips.Any(t => t.IsFinding)));
    }

    [Fact]
    public void AFailureWhileReading_ReachesTheCheckAndTheFindingsCaller_AsItself()
    {
        var source = new FailingSource(Fleet(), after: 7);

        var check = Assert.Throws<IOException>(() => CheckPipeline.Run(source).ToList());
        var findings = Assert.Throws<IOException>(() => FindingsPipeline.Run(source, FindingPolicy.Default, AsOf).ToList());

        Assert.Equal("the disk went away after 7 devices", check.Message);
        Assert.Equal("the disk went away after 7 devices", findings.Message);
    }

    [Fact]
    public void ACancelledCheck_Stops()
    {
        using var cancel = new CancellationTokenSource();
        var seen = 0;

        Assert.ThrowsAny<OperationCanceledException>(() =>
        {
            foreach (var judged in CheckPipeline.Run(Fleet(), cancel: cancel.Token))
            {
                if (++seen == 3)
                {
                    cancel.Cancel();
                }
            }
        });
        Assert.InRange(seen, 3, 12);
    }

    private static string Line(JudgedTrip j) =>
        $"{j.Trip.Tag.Value} {j.Trip.SourceLine} {j.Assessment.Verdict} {j.Assessment.Reason} {j.Assessment.Band.Range}";

    private sealed class FailingSource(MemorySource inner, int after) : ITripSource
    {
        public IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false)
        {
            var n = 0;
            foreach (var device in inner.Devices(only, withResistance))
            {
                if (n++ == after)
                {
                    throw new IOException($"the disk went away after {after} devices");
                }

                yield return device;
            }
        }

        public IEnumerable<DeviceRecords> PeersOf(AssetTag tag) => Devices();

        public IReadOnlyDictionary<string, CurveTable> CurveTables() => inner.CurveTables();

        public IReadOnlyDictionary<string, AmbientTable> AmbientTables() => inner.AmbientTables();

        public InstrumentRegister Instruments() => inner.Instruments();
    }
}
