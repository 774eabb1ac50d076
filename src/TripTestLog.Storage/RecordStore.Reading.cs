using Microsoft.Data.Sqlite;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage;

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
    internal const string TripsInDeviceOrder =
        "SELECT d.asset_tag, t.tested_at, t.stage, t.pole, t.current_a, t.tripped, t.time_s, t.start, t.ambient_c, t.instrument, t.technician, t.note, "
        + "t.source_file_id, t.source_line, t.found_ir_a, t.found_isd_a, t.found_ii_a, t.found_im_a, t.found_pickup_a, t.found_tms "
        + "FROM devices d CROSS JOIN trip_tests t ON t.device_id = d.id "
        + "WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE "
        + "ORDER BY d.asset_tag, t.tested_at, t.source_file_id, t.source_line";

    /// <summary>Contact readings by device, then test time: found by their (device_id, tested_at) index, as the trips are.</summary>
    internal const string ContactsInDeviceOrder =
        "SELECT d.asset_tag, c.tested_at, c.stage, c.pole, c.resistance_uohm, c.test_current_a, c.temperature_c, c.instrument, c.technician, "
        + "c.source_file_id, c.source_line FROM devices d CROSS JOIN contact_tests c ON c.device_id = d.id "
        + "WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE ORDER BY d.asset_tag, c.tested_at, c.source_file_id, c.source_line";

    /// <summary>Insulation readings by device, then test time.</summary>
    internal const string InsulationInDeviceOrder =
        "SELECT d.asset_tag, i.tested_at, i.stage, i.path, i.test_voltage_v, i.resistance_mohm, i.over_range, i.temperature_c, i.duration_s, "
        + "i.source_file_id, i.source_line FROM devices d CROSS JOIN insulation_tests i ON i.device_id = d.id "
        + "WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE ORDER BY d.asset_tag, i.tested_at, i.source_file_id, i.source_line";

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false)
    {
        using var revisions = TagQuery(
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE $tag IS NULL OR d.asset_tag = $tag COLLATE NOCASE ORDER BY d.asset_tag, r.id", only);
        var files = SourceFileNames();
        var tags = new TagCache();
        using var entries = revisions.ExecuteReader();
        using var trips = new TagStream<StoredTrip>(TagQuery(TripsInDeviceOrder, only), r => ReadTrip(r, tags, files));
        using var contacts = withResistance ? new TagStream<StoredMeasurement<ContactMeasurement>>(TagQuery(ContactsInDeviceOrder, only), r => ReadContact(r, tags, files)) : null;
        using var insulation = withResistance ? new TagStream<StoredMeasurement<InsulationMeasurement>>(TagQuery(InsulationInDeviceOrder, only), r => ReadInsulation(r, tags, files)) : null;
        var moreEntries = entries.Read();
        while (moreEntries)
        {
            var tag = entries.GetString(0);
            var history = new List<Device>();
            while (moreEntries && string.Equals(entries.GetString(0), tag, StringComparison.Ordinal))
            {
                history.Add(DeviceMapping.Read(entries));
                moreEntries = entries.Read();
            }

            yield return new DeviceRecords(new DeviceHistory(history), trips.Take(tag))
            {
                Contacts = contacts?.Take(tag) ?? [],
                Insulation = insulation?.Take(tag) ?? [],
            };
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

    private static StoredTrip ReadTrip(SqliteDataReader r, TagCache tags, Dictionary<long, string> files)
    {
        var assetTag = tags.Of(r.GetString(0));
        var time = Seconds.Of(r.GetDouble(6));
        var anyFound = false;
        for (var i = 14; i <= 19 && !anyFound; i++)
        {
            anyFound = !r.IsDBNull(i);
        }

        var found = anyFound ? new SettingsFound(A(r, 14), A(r, 15), A(r, 16), A(r, 17), A(r, 18), r.IsDBNull(19) ? null : r.GetDouble(19)) : null;
        var measurement = new TripMeasurement(
            assetTag,
            TestedAt.Parse(r.GetString(1)),
            Codes.Stage(r.GetString(2)),
            Pole.Parse(r.GetString(3)),
            Amperes.Of(r.GetDouble(4)),
            r.GetBoolean(5) ? TripOutcome.TrippedAfter(time) : TripOutcome.HeldFor(time),
            Codes.Start(r.GetString(7)),
            r.IsDBNull(8) ? null : Celsius.Of(r.GetDouble(8)),
            r.GetString(9),
            r.GetString(10),
            r.GetString(11))
        {
            FoundSettings = found is { IsEmpty: false } ? found : null,
        };
        return new StoredTrip(assetTag, measurement, files[r.GetInt64(12)], r.GetInt64(13));
    }

    private static StoredMeasurement<ContactMeasurement> ReadContact(SqliteDataReader r, TagCache tags, Dictionary<long, string> files) =>
        new(new ContactMeasurement(
            tags.Of(r.GetString(0)),
            TestedAt.Parse(r.GetString(1)),
            Codes.Stage(r.GetString(2)),
            Pole.Parse(r.GetString(3)),
            MicroOhms.Of(r.GetDouble(4)),
            Amperes.Of(r.GetDouble(5)),
            r.IsDBNull(6) ? null : Celsius.Of(r.GetDouble(6)),
            r.GetString(7),
            r.GetString(8)), files[r.GetInt64(9)], r.GetInt64(10));

    private static StoredMeasurement<InsulationMeasurement> ReadInsulation(SqliteDataReader r, TagCache tags, Dictionary<long, string> files) =>
        new(new InsulationMeasurement(
            tags.Of(r.GetString(0)),
            TestedAt.Parse(r.GetString(1)),
            Codes.Stage(r.GetString(2)),
            r.GetString(3),
            Volts.Of(r.GetDouble(4)),
            new InsulationReading(MegaOhms.Of(r.GetDouble(5)), r.GetBoolean(6)),
            r.IsDBNull(7) ? null : Celsius.Of(r.GetDouble(7)),
            r.IsDBNull(8) ? null : Seconds.Of(r.GetDouble(8))), files[r.GetInt64(9)], r.GetInt64(10));

    // A device's tests share one tag value instead of each allocating its own.
    private sealed class TagCache
    {
        private string? _text;
        private AssetTag _tag;

        public AssetTag Of(string text)
        {
            if (!string.Equals(text, _text, StringComparison.Ordinal))
            {
                _text = text;
                _tag = AssetTag.Of(text);
            }

            return _tag;
        }
    }
}
