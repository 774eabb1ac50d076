using TripTestLog.Application.Streams;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Every device's condition, device by device, in two streaming passes: the first learns each peer group's spread
/// (one number per device and point, judging only each point's latest test), the second raises each device's findings
/// and yields its condition. Memory holds one device's records and the peer statistics, however long the history.
/// </summary>
public static class FindingsPipeline
{
    /// <summary>
    /// The condition of every device (or of <paramref name="only"/>, still compared with all its peers in the fleet) on
    /// <paramref name="asOf"/>, in asset-tag order.
    /// </summary>
    public static IEnumerable<DeviceCondition> Run(ITripSource source, FindingPolicy policy, DateOnly asOf, AssetTag? only = null,
        CancellationToken cancel = default) =>
        RunWithRecords(source, policy, asOf, only, cancel).Select(d => d.Condition);

    /// <summary>As <see cref="Run"/>, with each device's records and judged trip tests beside its condition, for reports.</summary>
    public static IEnumerable<DeviceReport> RunWithRecords(ITripSource source, FindingPolicy policy, DateOnly asOf, AssetTag? only = null,
        CancellationToken cancel = default)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(policy);
        var judge = StoredPeerPositions.Judge(source, policy);
        var peers = new PeerGroups();
        if (!FromKeptPlaces(source, policy, judge, peers, only, cancel))
        {
            // The store is read a few devices ahead on another thread, so reading and judging overlap on two cores. For
            // one device, only the devices that can share one of its peer groups are read: its groups come out the same.
            foreach (var device in ReadAhead.Of(only is { } tag ? source.PeersOf(tag) : source.Devices(), 8, cancel))
            {
                cancel.ThrowIfCancellationRequested();
                PeerPass.Add(device, judge, peers);
            }
        }

        peers.Seal();

        // As check does: the store is read on one thread, each device judged and its findings raised on a second, and
        // the caller writes on its own. The peer groups are sealed, so the second stage only reads them.
        var devices = ReadAhead.Of(source.Devices(only, withResistance: true), 8, cancel);
        foreach (var report in ReadAhead.Of(devices.Select(d => ReportOf(d, judge, peers, policy, asOf, cancel)), 2, cancel))
        {
            cancel.ThrowIfCancellationRequested();
            yield return report;
        }
    }

    private static DeviceReport ReportOf(DeviceRecords device, DeviceJudge judge, PeerGroups peers, FindingPolicy policy, DateOnly asOf,
        CancellationToken cancel)
    {
        cancel.ThrowIfCancellationRequested();
        var trips = judge.Judge(device).ToList();
        return new DeviceReport(device, trips, DeviceFindings.Of(device, trips, peers, policy, judge.Instruments, asOf));
    }

    // The peer groups from the places the store keeps (for one device, its peers'; for the whole fleet, every device's),
    // the stale ones worked out afresh. False when the store keeps none.
    private static bool FromKeptPlaces(ITripSource source, FindingPolicy policy, DeviceJudge judge, PeerGroups peers, AssetTag? only,
        CancellationToken cancel)
    {
        if (source is not IPeerPositionStore stored)
        {
            return false;
        }

        if (only is { } one)
        {
            StoredPeerPositions.Fill(one, source, stored, policy, judge, peers, cancel);
            return true;
        }

        StoredPeerPositions.FillFleet(source, stored, policy, judge, peers, cancel);
        return true;
    }
}
