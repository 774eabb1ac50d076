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
        // Findings reads the fleet twice; the source fails only in the second read, the staged one, with the readings.
        var check = Assert.Throws<IOException>(() => CheckPipeline.Run(new FailingSource(Fleet(), after: 7)).ToList());
        var findingsSource = new FailingSource(Fleet(), after: 7, onlyWithReadings: true);
        var findings = Assert.Throws<IOException>(() => FindingsPipeline.Run(findingsSource, FindingPolicy.Default, AsOf).ToList());

        Assert.Equal("the disk went away after 7 devices", check.Message);
        Assert.Equal("the disk went away after 7 devices", findings.Message);
        Assert.Equal(2, findingsSource.Reads);
    }

    [Fact]
    public void ACallerThatStopsEarly_StopsTheReading_AndTheReadIsClosed()
    {
        var source = new FailingSource(Fleet(), after: int.MaxValue);

        var first = CheckPipeline.Run(source).Take(3).ToList();

        Assert.Equal(3, first.Count);
        Assert.Equal(1, source.Reads);
        Assert.Equal(1, source.Closed);
        Assert.InRange(source.Yielded, 1, 8);
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

    // A store that fails after so many devices (in every read, or only in one with contact and insulation readings),
    // and counts its reads, the devices it gave and the reads closed.
    private sealed class FailingSource(MemorySource inner, int after, bool onlyWithReadings = false) : ITripSource
    {
        public int Reads { get; private set; }

        public int Yielded { get; private set; }

        public int Closed { get; private set; }

        public IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false)
        {
            Reads++;
            try
            {
                var n = 0;
                foreach (var device in inner.Devices(only, withResistance))
                {
                    if (n++ == after && (withResistance || !onlyWithReadings))
                    {
                        throw new IOException($"the disk went away after {after} devices");
                    }

                    Yielded++;
                    yield return device;
                }
            }
            finally
            {
                Closed++;
            }
        }

        public IEnumerable<DeviceRecords> PeersOf(AssetTag tag) => Devices();

        public IReadOnlyDictionary<string, CurveTable> CurveTables() => inner.CurveTables();

        public IReadOnlyDictionary<string, AmbientTable> AmbientTables() => inner.AmbientTables();

        public InstrumentRegister Instruments() => inner.Instruments();
    }
}
