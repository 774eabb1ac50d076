using System.Globalization;
using TripTestLog.Application.Check;
using TripTestLog.Application.Streams;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Peer positions kept in the store: import brings them up to date for every device whose records or judging basis
/// changed, and one device's findings read its peers' stored positions, working out afresh only those that are stale.
/// The groups come out the same as from judging every peer's tests, which stays the way when much is stale.
/// </summary>
public static class StoredPeerPositions
{
    // Beyond this share of stale peers, reading the whole peer set in one query is cheaper than one query per device.
    private const double StaleShareForFullRead = 0.25;

    // Beyond this many stale devices, one ordered pass over the fleet is cheaper than one query per device.
    private const int StaleCountForFleetPass = 64;

    /// <summary>
    /// What positions depend on besides a device's own records: the policy's judging settings and the reference tables.
    /// Positions stored under another basis are not used.
    /// </summary>
    public static string Basis(FindingPolicy policy, IPeerPositionStore store)
    {
        ArgumentNullException.ThrowIfNull(policy);
        ArgumentNullException.ThrowIfNull(store);
        return string.Create(CultureInfo.InvariantCulture,
            $"1|{policy.RequireRegisteredInstruments}|{policy.AmbientNoteKelvin:R}|{policy.PointWindowPercent:R}|{policy.Decision}|{store.ReferenceStamp()}");
    }

    /// <summary>
    /// Works out and stores the positions of every device whose stored ones are missing or stale under
    /// <paramref name="policy"/>; returns how many devices that was. Positions are worked out before the short write.
    /// <paramref name="step"/> is called once a device, with the number of stale devices.
    /// </summary>
    public static int Refresh(ITripSource source, IPeerPositionStore store, FindingPolicy policy, CancellationToken cancel = default,
        Action<int>? step = null)
    {
        ArgumentNullException.ThrowIfNull(source);
        var basis = Basis(policy, store);
        var stale = store.StalePeers(basis);
        if (stale.Count == 0)
        {
            return 0;
        }

        var judge = Judge(source, policy);
        var stamps = stale.ToDictionary(s => s.Tag.Value, s => s.Stamp, AssetTag.Comparer);
        var positions = new List<DevicePeerPositions>(stale.Count);
        foreach (var device in ReadStale(source, [.. stale.Select(s => s.Tag)], cancel))
        {
            cancel.ThrowIfCancellationRequested();
            step?.Invoke(stale.Count);
            var tag = device.History.Latest.Tag;
            positions.Add(new DevicePeerPositions(tag, basis, stamps[tag.Value], [.. PeerPass.Positions(device, judge)]));
        }

        store.StorePeerPositions(positions);
        return positions.Count;
    }

    /// <summary>
    /// Fills <paramref name="peers"/> with the groups <paramref name="tag"/> can belong to: stored positions where they
    /// are current, worked out afresh where not.
    /// </summary>
    internal static void Fill(AssetTag tag, ITripSource source, IPeerPositionStore store, FindingPolicy policy, DeviceJudge judge, PeerGroups peers,
        CancellationToken cancel)
    {
        var basis = Basis(policy, store);
        var stored = store.StoredPeersOf(tag);
        var stale = stored.Where(p => p.Basis != basis || p.Stamp != p.StampNow).Select(p => p.Tag).ToList();
        if (stale.Count > stored.Count * StaleShareForFullRead)
        {
            foreach (var device in ReadAhead.Of(source.PeersOf(tag), 8, cancel))
            {
                cancel.ThrowIfCancellationRequested();
                PeerPass.Add(device, judge, peers);
            }

            return;
        }

        foreach (var peer in stored.Where(p => p.Basis == basis && p.Stamp == p.StampNow))
        {
            foreach (var (group, position) in peer.Positions)
            {
                peers.Add(group, position);
            }
        }

        foreach (var device in Read(source, stale, whole: false))
        {
            cancel.ThrowIfCancellationRequested();
            PeerPass.Add(device, judge, peers);
        }
    }

    /// <summary>
    /// Fills <paramref name="peers"/> with every device's positions for a run over the whole fleet: the stored ones
    /// where they are current, and the stale devices worked out afresh (after a policy change, all of them).
    /// </summary>
    internal static void FillFleet(ITripSource source, IPeerPositionStore store, FindingPolicy policy, DeviceJudge judge, PeerGroups peers,
        CancellationToken cancel)
    {
        var stale = store.CurrentPositions(Basis(policy, store), peers.Add);
        foreach (var device in ReadStale(source, stale, cancel))
        {
            cancel.ThrowIfCancellationRequested();
            PeerPass.Add(device, judge, peers);
        }
    }

    internal static DeviceJudge Judge(ITripSource source, FindingPolicy policy) =>
        DeviceJudge.For(source, policy.RequireRegisteredInstruments, policy.AmbientNoteKelvin, policy.PointWindowPercent / 100, policy.Decision);

    // The stale devices' records, read ahead: one query each when few, else one pass over the fleet keeping only them.
    private static IEnumerable<DeviceRecords> ReadStale(ITripSource source, IReadOnlyList<AssetTag> stale, CancellationToken cancel)
    {
        var wanted = new HashSet<string>(AssetTag.Comparer);
        foreach (var tag in stale)
        {
            wanted.Add(tag.Value);
        }

        return ReadAhead.Of(Read(source, stale, whole: stale.Count > StaleCountForFleetPass), 8, cancel)
            .Where(d => wanted.Contains(d.History.Latest.Tag.Value));
    }

    // Many devices are read in one pass over the fleet; a few, one query each.
    private static IEnumerable<DeviceRecords> Read(ITripSource source, IEnumerable<AssetTag> tags, bool whole) =>
        whole ? source.Devices() : tags.SelectMany(tag => source.Devices(tag));
}
