using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using Microsoft.Data.Sqlite;
using TripTestLog.Storage.Entities;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
    /// <summary>Every device in the register, by asset tag.</summary>
    public IReadOnlyList<Device> RegisterEntries()
    {
        using var select = _connection.CreateCommand();
        select.CommandText = $"SELECT asset_tag, {DeviceMapping.Columns} FROM devices ORDER BY asset_tag";
        using var reader = select.ExecuteReader();
        var devices = new List<Device>();
        while (reader.Read())
        {
            devices.Add(DeviceMapping.Read(reader));
        }

        return devices;
    }

    /// <summary>How many stored revisions the register entry of <paramref name="tag"/> has, oldest first.</summary>
    public int RevisionCount(AssetTag tag)
    {
        using var count = _connection.CreateCommand();
        count.CommandText = "SELECT COUNT(*) FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE d.asset_tag = $tag";
        count.Parameters.AddWithValue("$tag", tag.Value);
        return Convert.ToInt32(count.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
    }

    /// <summary>Every trip test, ordered by asset tag, then test time, then file line; optionally for one device.</summary>
    public IReadOnlyList<StoredTrip> Trips(AssetTag? only = null) => Devices(only).SelectMany(d => d.Trips).ToList();
}
