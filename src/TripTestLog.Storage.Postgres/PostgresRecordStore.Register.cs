using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    /// <summary>
    /// The register import, as on SQLite: new devices added, every new entry kept as a revision, the `devices` row
    /// holding the entry with the newest settings; counted per row as added, updated or duplicate.
    /// </summary>
    private (long Added, long Updated, long Duplicates) ImportRegister(NpgsqlTransaction transaction, ParsedFile file, long sourceId, DateTimeOffset now)
    {
        var stored = StoredEntries(transaction);
        long added = 0, updated = 0, duplicates = 0;
        var seen = new HashSet<Device>();
        var lines = new Dictionary<Device, long>();
        var touched = new HashSet<string>(AssetTag.Comparer);
        var newHere = new HashSet<string>(AssetTag.Comparer);

        using var insert = Command(
            $"INSERT INTO devices (asset_tag, {DeviceMapping.Columns}, source_file_id, source_line) VALUES (@tag, {ServerSql.RegisterValues}, @source, @line) RETURNING id",
            transaction);
        using var revision = Command(
            $"INSERT INTO device_revisions (device_id, {DeviceMapping.Columns}, source_file_id, source_line, recorded_at) "
            + $"VALUES (@device, {ServerSql.RegisterValues}, @source, @line, @at)", transaction);
        revision.Parameters.Add(new NpgsqlParameter("at", NpgsqlDbType.TimestampTz) { Value = now.ToUniversalTime() });

        foreach (var (device, line) in file.Devices)
        {
            var tag = device.Tag.Value;
            if (!seen.Add(device))
            {
                duplicates++;
                continue;
            }

            lines[device] = line;
            if (!stored.TryGetValue(tag, out var entries))
            {
                ServerSql.Bind(insert, device, sourceId, line);
                entries = ((long)insert.ExecuteScalar()!, []);
                stored[tag] = entries;
                newHere.Add(tag);
                added++;
            }
            else if (entries.Revisions.Contains(device))
            {
                continue;
            }
            else if (newHere.Contains(tag))
            {
                // A later entry of a device this file brings in (its settings history) is new too, not an update.
                added++;
            }
            else
            {
                updated++;
            }

            ServerSql.Bind(revision, device, sourceId, line);
            ServerSql.Set(revision, "device", entries.Id);
            revision.ExecuteNonQuery();
            entries.Revisions.Add(device);
            touched.Add(tag);
        }

        using var update = Command(
            $"UPDATE devices SET ({DeviceMapping.Columns}, source_file_id, source_line) = ({ServerSql.RegisterValues}, @source, @line) "
            + $"WHERE {ServerSql.TagKey("asset_tag")} = {ServerSql.TagKey("@tag")}", transaction);
        foreach (var tag in touched)
        {
            var latest = new DeviceHistory(stored[tag].Revisions).Latest;
            if (lines.TryGetValue(latest, out var line))
            {
                ServerSql.Bind(update, latest, sourceId, line);
                update.ExecuteNonQuery();
            }
        }

        return (added, updated, duplicates);
    }

    private Dictionary<string, (long Id, List<Device> Revisions)> StoredEntries(NpgsqlTransaction transaction)
    {
        using var select = Command(
            $"SELECT d.id, d.asset_tag, {ServerSql.RegisterSelect("r")} FROM device_revisions r JOIN devices d ON d.id = r.device_id ORDER BY r.id", transaction);
        using var reader = select.ExecuteReader();
        var entries = new Dictionary<string, (long Id, List<Device> Revisions)>(AssetTag.Comparer);
        while (reader.Read())
        {
            var device = DeviceMapping.Read(reader, first: 1);
            if (!entries.TryGetValue(device.Tag.Value, out var entry))
            {
                entry = (reader.GetInt64(0), []);
                entries[device.Tag.Value] = entry;
            }

            entry.Revisions.Add(device);
        }

        return entries;
    }
}
