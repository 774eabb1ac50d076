using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Application.Findings;

/// <summary>
/// peer-outlier: a device's latest as-found result at a point far from its peers', by the modified z-score on the
/// median absolute deviation (Iglewicz and Hoaglin, 1993, "How to Detect and Handle Outliers": |M| &gt; 3.5), and only
/// in a group of at least the policy's number of devices.
/// </summary>
internal static class PeerRule
{
    public static void Apply(IReadOnlyList<(TripPoint Point, List<JudgedTrip> Tests)> points, PeerGroups peers, FindingLedger ledger, FindingPolicy policy)
    {
        foreach (var (point, latest, position) in TripRules.Positions(points))
        {
            var (key, name) = PeerGroups.GroupOf(latest.Device, point);
            if (peers.Of(key) is not { } group || group.Count < policy.PeerMinimumDevices
                || RobustStatistics.ModifiedZScore(position, group.Median, group.Mad) is not { } z || Math.Abs(z) <= policy.PeerScoreLimit
                || Math.Abs(position - group.Median) * 100 < policy.PeerMinimumBandPercent)
            {
                continue;
            }

            var m = latest.Trip.Measurement;
            ledger.Add(new Finding(FindingKind.PeerOutlier, Severity.Investigate, m.Tag, m.TestedAt,
                new TripFacts.PeerOutlier(point.Label, z > 0, group.Count - 1, name, position, group.Median),
                [TripRules.Source(latest)])
            {
                Point = point.Label,
                Value = new Reading(z, ReadingUnit.Score),
                Limit = new Reading(policy.PeerScoreLimit, ReadingUnit.Score),
                Policy = $"{PolicyFile.Setting(policy, "peer_z_limit")}; {PolicyFile.Setting(policy, "peer_min_devices")}; {PolicyFile.Setting(policy, "peer_min_band_percent")}",
            });
        }
    }
}
