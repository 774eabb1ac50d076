using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Check;

/// <summary>The read side of a store, as the check pipeline needs it (SQLite today; a server database later).</summary>
public interface ITripSource
{
    /// <summary>
    /// Every registered device, in asset-tag order, each with its register history and its trip tests in test-time
    /// order; streamed, so only one device is held at a time. <paramref name="only"/> limits it to one device;
    /// <paramref name="withResistance"/> adds its contact and insulation readings.
    /// </summary>
    IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false);

    /// <summary>
    /// The devices that may share a peer group with <paramref name="tag"/>, itself included: those with a register entry
    /// of the same family and rated current as one of its entries, streamed as <see cref="Devices"/> streams them (trip
    /// tests only). A peer group is a family, a setting and a rating, so no other device can fall in one of its groups.
    /// </summary>
    IEnumerable<DeviceRecords> PeersOf(AssetTag tag);

    /// <summary>Every curve table, each as the newest imported file defines it.</summary>
    IReadOnlyDictionary<string, CurveTable> CurveTables();

    /// <summary>Every ambient table, each as the newest imported file defines it.</summary>
    IReadOnlyDictionary<string, AmbientTable> AmbientTables();

    /// <summary>The instrument register.</summary>
    InstrumentRegister Instruments();
}

/// <summary>One device as the store holds it: its register entries and its trip tests.</summary>
/// <param name="History">Every register entry the device has had.</param>
/// <param name="Trips">Its trip tests, by test time, then as imported.</param>
public sealed record DeviceRecords(DeviceHistory History, IReadOnlyList<StoredTrip> Trips)
{
    /// <summary>Its contact resistance readings by test time, when asked for.</summary>
    public IReadOnlyList<StoredMeasurement<ContactMeasurement>> Contacts { get; init; } = [];

    /// <summary>Its insulation readings by test time, when asked for.</summary>
    public IReadOnlyList<StoredMeasurement<InsulationMeasurement>> Insulation { get; init; } = [];
}
