using Microsoft.Data.Sqlite;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// The streaming read: two ordered queries (register revisions, trip tests) merged by asset tag, so one device is
/// held at a time. The trips query finds each device's tests by IX_trip_tests_device; DEVELOPERS.md shows its plan.
/// </summary>
public sealed partial class RecordStore : ITripSource
{
    /// <summary>
    /// The trip query the check reader runs, by device and then test time: its plan is pinned by a test. CROSS JOIN
    /// fixes the join order (SQLite keeps it as written), so devices are walked by their asset-tag index, each device's
    /// tests are found by IX_trip_tests_device and only they are sorted by time: never a sort of the whole table.
    /// </summary>
    internal const string TripsInDeviceOrder = TripsOf + "$tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE " + TripOrder;

    // The trip query's parts around its device filter: PeersOf reads the same rows in the same order for other devices.
    private const string TripsOf = "SELECT " + StoredColumns.Trips + " FROM devices d CROSS JOIN trip_tests t ON t.device_id = d.id WHERE ";

    private const string TripOrder = "ORDER BY d.asset_tag, t.tested_at, t.source_file_id, t.source_line";

    /// <summary>Contact readings by device, then test time: found by their (device_id, tested_at) index, as the trips are.</summary>
    internal const string ContactsInDeviceOrder =
        "SELECT " + StoredColumns.Contacts + " FROM devices d CROSS JOIN contact_tests c ON c.device_id = d.id "
        + "WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE ORDER BY d.asset_tag, c.tested_at, c.source_file_id, c.source_line";

    /// <summary>Insulation readings by device, then test time.</summary>
    internal const string InsulationInDeviceOrder =
        "SELECT " + StoredColumns.Insulation + " FROM devices d CROSS JOIN insulation_tests i ON i.device_id = d.id "
        + "WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE ORDER BY d.asset_tag, i.tested_at, i.source_file_id, i.source_line";

    /// <summary>The devices sharing a family and a rated current with some register entry of the device tagged $tag.</summary>
    private const string PeerDevices =
        "d.id IN (SELECT p.device_id FROM devices o JOIN device_revisions r ON r.device_id = o.id "
        + "JOIN device_revisions p ON p.family = r.family AND p.rated_current_a = r.rated_current_a WHERE o.asset_tag = $tag COLLATE NOCASE)";

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> PeersOf(AssetTag tag)
    {
        using var snapshot = ReadTransaction.Begin(_connection);
        using var revisions = TagQuery(
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + $"FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE {PeerDevices} ORDER BY d.asset_tag, r.id", tag);
        var rows = new StoredRows(SourceFileNames(), r => TestedAt.Parse(r.GetString(1)));
        using var entries = revisions.ExecuteReader();
        using var trips = new TagStream<StoredTrip>(TagQuery($"{TripsOf}{PeerDevices} {TripOrder}", tag), rows.Trip);
        foreach (var device in DeviceWalk.Merge(entries, trips, null, null))
        {
            yield return device;
        }
    }

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false)
    {
        // One read transaction around every query: the file names, the register and the measurements are one snapshot,
        // so an import that commits meanwhile is seen by none of them or by all (a record never names a file not read).
        using var snapshot = ReadTransaction.Begin(_connection);
        using var revisions = TagQuery(
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE ORDER BY d.asset_tag, r.id", only);
        var files = SourceFileNames();
        var rows = new StoredRows(files, r => TestedAt.Parse(r.GetString(1)));
        using var entries = revisions.ExecuteReader();
        using var trips = new TagStream<StoredTrip>(TagQuery(TripsInDeviceOrder, only), rows.Trip);
        using var contacts = withResistance ? new TagStream<StoredMeasurement<ContactMeasurement>>(TagQuery(ContactsInDeviceOrder, only), rows.Contact) : null;
        using var insulation = withResistance ? new TagStream<StoredMeasurement<InsulationMeasurement>>(TagQuery(InsulationInDeviceOrder, only), rows.Insulation) : null;
        foreach (var device in DeviceWalk.Merge(entries, trips, contacts, insulation))
        {
            yield return device;
        }
    }

    private SqliteCommand TagQuery(string sql, AssetTag? only)
    {
        var command = _connection.CreateCommand();
        command.CommandText = sql;
        command.Parameters.AddWithValue("$tag", (object?)only?.Value ?? DBNull.Value);
        return command;
    }

    private Dictionary<long, string> SourceFileNames()
    {
        using var select = _connection.CreateCommand();
        select.CommandText = "SELECT id, file_name FROM source_files";
        using var reader = select.ExecuteReader();
        var names = new Dictionary<long, string>();
        while (reader.Read())
        {
            names[reader.GetInt64(0)] = reader.GetString(1);
        }

        return names;
    }
}
