using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Tests;

/// <summary>
/// The read port over records held in memory: typed devices and measurements, no file and no database, streamed in
/// asset-tag order as a store streams them. Every device may be a peer of every other (the port allows a wider set).
/// </summary>
internal sealed class MemorySource(params DeviceRecords[] devices) : ITripSource
{
    private readonly DeviceRecords[] _devices = [.. devices.OrderBy(d => d.History.Latest.Tag.Value, AssetTag.Comparer)];

    public IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false) =>
        _devices.Where(d => only is not { } tag || AssetTag.Comparer.Equals(d.History.Latest.Tag.Value, tag.Value))
            .Select(d => withResistance ? d : d with { Contacts = [], Insulation = [] });

    public IEnumerable<DeviceRecords> PeersOf(AssetTag tag) => Devices();

    public IReadOnlyDictionary<string, CurveTable> CurveTables() => new Dictionary<string, CurveTable>();

    public IReadOnlyDictionary<string, AmbientTable> AmbientTables() => new Dictionary<string, AmbientTable>();

    public InstrumentRegister Instruments() => InstrumentRegister.Empty;
}
