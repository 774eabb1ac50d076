using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Findings;

/// <summary>
/// A store that keeps each device's place among its peers (its latest as-found result at each point, placed in its
/// band), so one device's findings read its peer groups' figures instead of judging every peer's tests. The positions
/// are derived data: each device's are kept with the basis and the stamp of the records they came from, and used only
/// while both still match. A store that does not keep them leaves the findings to work them out, with the same result.
/// </summary>
public interface IPeerPositionStore
{
    /// <summary>A stamp of what judging depends on besides a device's own records: the instrument, curve and ambient tables.</summary>
    string ReferenceStamp();

    /// <summary>
    /// The devices that may share a peer group with <paramref name="tag"/> (as <c>ITripSource.PeersOf</c> chooses them),
    /// each with its stored positions, what they were worked out from, and its records' stamp now; in asset-tag order.
    /// </summary>
    IReadOnlyList<StoredPeer> StoredPeersOf(AssetTag tag);

    /// <summary>Every device whose stored positions are missing, or were worked out from another basis or other records.</summary>
    IReadOnlyList<(AssetTag Tag, string Stamp)> StalePeers(string basis);

    /// <summary>
    /// Every device's stored positions read in one consistent state: those still current under <paramref name="basis"/>
    /// are passed to <paramref name="add"/> as they are read; the devices whose positions are missing or stale are
    /// returned, in asset-tag order, to be worked out.
    /// </summary>
    IReadOnlyList<AssetTag> CurrentPositions(string basis, Action<string, double> add);

    /// <summary>Replaces the stored positions of each device given, in one transaction.</summary>
    void StorePeerPositions(IEnumerable<DevicePeerPositions> devices);
}

/// <summary>One device's stored positions, as <see cref="IPeerPositionStore.StoredPeersOf"/> reads them.</summary>
/// <param name="Tag">The device.</param>
/// <param name="Basis">The basis they were worked out under; null when none are stored.</param>
/// <param name="Stamp">The stamp of the records they were worked out from; null when none are stored.</param>
/// <param name="StampNow">The stamp of the device's records now.</param>
/// <param name="Positions">Each group (family, settings, rating and point) and the device's position in it.</param>
public sealed record StoredPeer(AssetTag Tag, string? Basis, string? Stamp, string StampNow, IReadOnlyList<(string Group, double Position)> Positions);

/// <summary>One device's positions to store, with the basis and the stamp of the records they were worked out from.</summary>
public sealed record DevicePeerPositions(AssetTag Tag, string Basis, string Stamp, IReadOnlyList<(string Group, double Position)> Positions);
