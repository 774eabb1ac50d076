using TripTestLog.Application.Check;
using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>
/// The first pass of the findings: each device's latest assessable as-found trip at each point, placed in its band,
/// for the peer groups. Tests are grouped by point from their envelope alone, and only the latest of each point is
/// judged (walking back past one that is not assessable), so this pass costs little more than reading: the same
/// result the second pass's <see cref="TripRules.Positions(IReadOnlyList{JudgedTrip})"/> gives, without judging every test.
/// </summary>
internal static class PeerPass
{
    public static void Add(DeviceRecords device, DeviceJudge judge, PeerGroups peers)
    {
        foreach (var (key, position) in Positions(device, judge))
        {
            peers.Add(key, position);
        }
    }

    /// <summary>The device's position at each of its points, under the peer group each belongs to.</summary>
    public static IEnumerable<(string Group, double Position)> Positions(DeviceRecords device, DeviceJudge judge)
    {
        var assessor = new TripAssessor(judge.Curves, judge.Ambients, judge.AmbientNoteKelvin, judge.PointWindow, judge.Decision, judge.Instruments);
        var byPoint = new Dictionary<string, (TripPoint Point, List<int> Tests)>(StringComparer.Ordinal);
        for (var i = 0; i < device.Trips.Count; i++)
        {
            var m = device.Trips[i].Measurement;
            if (m.Stage != TestStage.AsFound || !m.Outcome.Tripped)
            {
                continue;
            }

            var (entry, envelope) = assessor.EnvelopeOf(device.History, m);
            var point = TripPoint.Of(m, envelope, entry.Poles);
            if (!byPoint.TryGetValue(point.Key, out var tests))
            {
                byPoint[point.Key] = tests = (point, []);
            }

            tests.Tests.Add(i);
        }

        foreach (var (point, tests) in byPoint.Values)
        {
            for (var k = tests.Count - 1; k >= 0; k--)
            {
                var i = tests[k];
                var result = assessor.Assess(device.History, device.Trips[i].Measurement, i > 0 ? device.Trips[i - 1].Measurement : null);
                if (result.Assessment.Verdict == Verdict.NotAssessable)
                {
                    continue;
                }

                if (result.Assessment.Margin.PositionInBand is { } position)
                {
                    yield return (PeerGroups.GroupOf(result.Device, point).Key, position);
                }

                break;
            }
        }
    }
}
