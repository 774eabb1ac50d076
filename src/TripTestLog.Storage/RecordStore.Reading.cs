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
        + "WHERE $tag IS NULL OR d.asset_tag = $tag "
        + "ORDER BY d.asset_tag, t.tested_at, t.source_file_id, t.source_line";

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> Devices(AssetTag? only = null)
    {
        using var revisions = _connection.CreateCommand();
        revisions.CommandText =
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE $tag IS NULL OR d.asset_tag = $tag ORDER BY d.asset_tag, r.id";
        revisions.Parameters.AddWithValue("$tag", (object?)only?.Value ?? DBNull.Value);
        using var trips = _connection.CreateCommand();
        trips.CommandText = TripsInDeviceOrder;
        trips.Parameters.AddWithValue("$tag", (object?)only?.Value ?? DBNull.Value);
        var files = SourceFileNames();
        using var entries = revisions.ExecuteReader();
        using var tests = trips.ExecuteReader();
        var moreEntries = entries.Read();
        var moreTests = tests.Read();
        var tags = new TagCache();
        while (moreEntries)
        {
            var tag = entries.GetString(0);
            var history = new List<Device>();
            while (moreEntries && string.Equals(entries.GetString(0), tag, StringComparison.Ordinal))
            {
                history.Add(DeviceMapping.Read(entries));
                moreEntries = entries.Read();
            }

            var list = new List<StoredTrip>();
            while (moreTests && string.CompareOrdinal(tests.GetString(0), tag) <= 0)
            {
                // Both queries order by the same binary collation, so a test's device is never behind the register.
                if (string.Equals(tests.GetString(0), tag, StringComparison.Ordinal))
                {
                    list.Add(ReadTrip(tests, tags, files));
                }

                moreTests = tests.Read();
            }

            yield return new DeviceRecords(new DeviceHistory(history), list);
        }
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
