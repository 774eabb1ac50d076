using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using Microsoft.EntityFrameworkCore;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    /// <summary>How many records of each kind the store holds.</summary>
    public StoreCounts Counts() => new(
        _context.SourceFiles.LongCount(),
        _context.Devices.LongCount(),
        _context.TripTests.LongCount(),
        _context.ContactTests.LongCount(),
        _context.InsulationTests.LongCount());

    /// <summary>Every device in the register, by asset tag.</summary>
    public IReadOnlyList<Device> RegisterEntries()
    {
        using var select = _connection.CreateCommand();
        select.CommandText = $"SELECT asset_tag, {RegisterColumns} FROM devices ORDER BY asset_tag";
        using var reader = select.ExecuteReader();
        var devices = new List<Device>();
        while (reader.Read())
        {
            devices.Add(DeviceMapping.Read(reader));
        }

        return devices;
    }

    /// <summary>How many stored revisions the register entry of <paramref name="tag"/> has, oldest first.</summary>
    public int RevisionCount(AssetTag tag) =>
        (from r in _context.DeviceRevisions
         join d in _context.Devices on r.DeviceId equals d.Id
         where d.AssetTag == tag.Value
         select r.Id).Count();

    /// <summary>Every trip test, ordered by asset tag, then test time, then file line; optionally for one device.</summary>
    public IReadOnlyList<StoredTrip> Trips(AssetTag? only = null) => Devices(only).SelectMany(d => d.Trips).ToList();

    /// <summary>Every device's register entries, oldest first, by asset tag.</summary>
    public IReadOnlyDictionary<string, DeviceHistory> Histories()
    {
        using var select = _connection.CreateCommand();
        select.CommandText =
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id ORDER BY d.asset_tag, r.id";
        using var reader = select.ExecuteReader();
        return DeviceMapping.Histories(reader);
    }

    /// <summary>Every curve table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, CurveTable> CurveTables()
    {
        return StoredTables.Curves(_context.CurveTableRows.AsNoTracking().AsEnumerable());
    }

    /// <summary>Every ambient table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, AmbientTable> AmbientTables()
    {
        return StoredTables.Ambients(_context.AmbientTableRows.AsNoTracking().AsEnumerable());
    }

}
