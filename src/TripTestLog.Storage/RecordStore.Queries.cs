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
    public IReadOnlyList<Device> Devices()
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
    public IReadOnlyList<StoredTrip> Trips(AssetTag? only = null)
    {
        using var select = _connection.CreateCommand();
        select.CommandText =
            "SELECT d.asset_tag, t.tested_at, t.stage, t.pole, t.current_a, t.tripped, t.time_s, t.start, t.ambient_c, t.instrument, t.technician, t.note, "
            + "f.file_name, t.source_line, t.found_ir_a, t.found_isd_a, t.found_ii_a, t.found_im_a, t.found_pickup_a, t.found_tms "
            + "FROM trip_tests t JOIN devices d ON d.id = t.device_id JOIN source_files f ON f.id = t.source_file_id "
            + (only is null ? "" : "WHERE d.asset_tag = $tag ")
            + "ORDER BY d.asset_tag, t.tested_at, f.id, t.source_line";
        if (only is { } tag)
        {
            select.Parameters.AddWithValue("$tag", tag.Value);
        }

        using var r = select.ExecuteReader();
        var trips = new List<StoredTrip>();
        var tags = new Dictionary<string, AssetTag>(StringComparer.Ordinal);
        while (r.Read())
        {
            var tagText = r.GetString(0);
            if (!tags.TryGetValue(tagText, out var assetTag))
            {
                assetTag = AssetTag.Of(tagText);
                tags[tagText] = assetTag;
            }

            var time = Seconds.Of(r.GetDouble(6));
            var found = new SettingsFound(A(r, 14), A(r, 15), A(r, 16), A(r, 17), A(r, 18), r.IsDBNull(19) ? null : r.GetDouble(19));
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
                FoundSettings = found.IsEmpty ? null : found,
            };
            trips.Add(new StoredTrip(assetTag, measurement, r.GetString(12), r.GetInt64(13)));
        }

        return trips;
    }

    /// <summary>Every device's register entries, oldest first, by asset tag.</summary>
    public IReadOnlyDictionary<string, DeviceHistory> Histories()
    {
        using var select = _connection.CreateCommand();
        select.CommandText =
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id ORDER BY d.asset_tag, r.id";
        using var reader = select.ExecuteReader();
        var entries = new Dictionary<string, List<Device>>(StringComparer.Ordinal);
        while (reader.Read())
        {
            var device = DeviceMapping.Read(reader);
            if (!entries.TryGetValue(device.Tag.Value, out var list))
            {
                entries[device.Tag.Value] = list = [];
            }

            list.Add(device);
        }

        return entries.ToDictionary(kv => kv.Key, kv => new DeviceHistory(kv.Value), StringComparer.Ordinal);
    }

    /// <summary>Every curve table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, CurveTable> CurveTables()
    {
        var rows = _context.CurveTableRows.AsNoTracking().ToList();
        return rows.GroupBy(r => r.TableName, StringComparer.Ordinal).ToDictionary(
            g => g.Key,
            g =>
            {
                var newest = g.Max(r => r.SourceFileId);
                return CurveTable.Create(g.Key, g.Where(r => r.SourceFileId == newest).OrderBy(r => r.SourceLine)
                    .Select(r => new CurveTablePoint(CurrentMultiple.Of(r.Multiple), Seconds.Of(r.MinS), r.MaxS is { } m ? Seconds.Of(m) : null)).ToList());
            },
            StringComparer.Ordinal);
    }

    /// <summary>Every ambient table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, AmbientTable> AmbientTables()
    {
        var rows = _context.AmbientTableRows.AsNoTracking().ToList();
        return rows.GroupBy(r => r.TableName, StringComparer.Ordinal).ToDictionary(
            g => g.Key,
            g =>
            {
                var newest = g.Max(r => r.SourceFileId);
                return AmbientTable.Create(g.Key, g.Where(r => r.SourceFileId == newest).OrderBy(r => r.SourceLine)
                    .Select(r => new AmbientPoint(Celsius.Of(r.AmbientC), r.CurrentFactor)).ToList());
            },
            StringComparer.Ordinal);
    }

    private static Amperes? A(System.Data.Common.DbDataReader r, int i) => r.IsDBNull(i) ? null : Amperes.Of(r.GetDouble(i));
}
