namespace TripTestLog.Storage.Entities;

/// <summary>
/// What a device's stored peer positions were worked out from: the judging basis (policy and reference tables) and the
/// device's own records (its trip tests and register entries, by count and newest id). Derived data: a reader uses the
/// positions only while both still match, and works them out afresh otherwise.
/// </summary>
internal sealed class PeerStampRow
{
    public long DeviceId { get; set; }

    public string Basis { get; set; } = "";

    public string Stamp { get; set; } = "";
}
