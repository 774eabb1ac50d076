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
    /// <summary>How many records of each kind the store holds.</summary>
    public StoreCounts Counts() => new(
        Scalar("SELECT COUNT(*) FROM source_files"),
        Scalar("SELECT COUNT(*) FROM devices"),
        Scalar("SELECT COUNT(*) FROM trip_tests"),
        Scalar("SELECT COUNT(*) FROM contact_tests"),
        Scalar("SELECT COUNT(*) FROM insulation_tests"));

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
    public int RevisionCount(AssetTag tag)
    {
        using var count = _connection.CreateCommand();
        count.CommandText = "SELECT COUNT(*) FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE d.asset_tag = $tag";
        count.Parameters.AddWithValue("$tag", tag.Value);
        return Convert.ToInt32(count.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
    }

    /// <summary>Every trip test, ordered by asset tag, then test time, then file line; optionally for one device.</summary>
    public IReadOnlyList<StoredTrip> Trips(AssetTag? only = null) => Devices(only).SelectMany(d => d.Trips).ToList();

    /// <inheritdoc />
    public IReadOnlyDictionary<string, DeviceHistory> Histories(AssetTag? only = null)
    {
        using var select = TagQuery(
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE ORDER BY d.asset_tag, r.id",
            only);
        using var reader = select.ExecuteReader();
        return DeviceMapping.Histories(reader);
    }

    /// <summary>Every curve table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, CurveTable> CurveTables()
    {
        return StoredTables.Curves(Rows(
            "SELECT table_name, multiple, min_s, max_s, source_file_id, source_line FROM curve_table_rows",
            r => new CurveTableRowEntity
            {
                TableName = r.GetString(0), Multiple = r.GetDouble(1), MinS = r.GetDouble(2), MaxS = r.IsDBNull(3) ? null : r.GetDouble(3),
                SourceFileId = r.GetInt64(4), SourceLine = r.GetInt64(5),
            }));
    }

    /// <summary>Every ambient table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, AmbientTable> AmbientTables()
    {
        return StoredTables.Ambients(Rows(
            "SELECT table_name, ambient_c, current_factor, source_file_id, source_line FROM ambient_table_rows",
            r => new AmbientTableRowEntity
            {
                TableName = r.GetString(0), AmbientC = r.GetDouble(1), CurrentFactor = r.GetDouble(2), SourceFileId = r.GetInt64(3), SourceLine = r.GetInt64(4),
            }));
    }

    // Every row <paramref name="sql"/> selects, read by <paramref name="read"/>; for the small tables read whole.
    private List<T> Rows<T>(string sql, Func<SqliteDataReader, T> read)
    {
        using var select = _connection.CreateCommand();
        select.CommandText = sql;
        using var reader = select.ExecuteReader();
        var rows = new List<T>();
        while (reader.Read())
        {
            rows.Add(read(reader));
        }

        return rows;
    }

}
