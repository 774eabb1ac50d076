namespace TripTestLog.Storage.Entities;

/// <summary>One device's latest as-found result at one test point, placed in its band, under the group it belongs to.</summary>
internal sealed class PeerPositionRow
{
    public long Id { get; set; }

    public long DeviceId { get; set; }

    public string GroupKey { get; set; } = "";

    public double Position { get; set; }
}
