using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    private const string RegisterColumns = DeviceMapping.Columns;

    private const string RegisterValues = DeviceMapping.Parameters;

    /// <summary>
    /// Adds new devices and keeps every new register entry as a revision. A register may list several entries for one
    /// device with different settings_from dates (its settings history). The `devices` row holds the entry with the
    /// newest settings. Counts are per row: a row adds an entry of a device new to the database (added), adds an entry to a
    /// device stored before (updated), repeats an earlier row of the file, or matches a stored entry.
    /// </summary>
    private (long Added, long Updated, long Duplicates) ImportRegister(SqliteTransaction transaction, ParsedFile file, long sourceId, DateTimeOffset now)
    {
        var stored = StoredEntries(transaction);
        long added = 0, updated = 0, duplicates = 0;
        var seen = new HashSet<Device>();
        var lines = new Dictionary<Device, long>();
        var touched = new HashSet<string>(AssetTag.Comparer);
        var newHere = new HashSet<string>(AssetTag.Comparer);

        using var insert = Command(transaction,
            $"INSERT INTO devices (asset_tag, {RegisterColumns}, source_file_id, source_line) VALUES ($tag, {RegisterValues}, $source, $line) RETURNING id");
        using var revision = Command(transaction,
            $"INSERT INTO device_revisions (device_id, {RegisterColumns}, source_file_id, source_line, recorded_at) "
            + $"VALUES ($device, {RegisterValues}, $source, $line, $at)");

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
                Bind(insert, device, sourceId, line);
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

            Bind(revision, device, sourceId, line);
            Set(revision, "$device", entries.Id);
            Set(revision, "$at", Utc(now));
            revision.ExecuteNonQuery();
            entries.Revisions.Add(device);
            touched.Add(tag);
        }

        using var update = Command(transaction,
            $"UPDATE devices SET ({RegisterColumns}, source_file_id, source_line) = ({RegisterValues}, $source, $line) WHERE asset_tag = $tag COLLATE NOCASE");
        foreach (var tag in touched)
        {
            var latest = new DeviceHistory(stored[tag].Revisions).Latest;
            if (lines.TryGetValue(latest, out var line))
            {
                Bind(update, latest, sourceId, line);
                update.ExecuteNonQuery();
            }
        }

        return (added, updated, duplicates);
    }

    private Dictionary<string, (long Id, List<Device> Revisions)> StoredEntries(SqliteTransaction transaction)
    {
        using var select = Command(transaction,
            $"SELECT d.id, d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id ORDER BY r.id");
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

    private static void Bind(SqliteCommand command, Device d, long sourceId, long line)
    {
        Set(command, "$tag", d.Tag.Value);
        foreach (var (name, value) in DeviceMapping.Values(d))
        {
            Set(command, name, value);
        }

        Set(command, "$source", sourceId);
        Set(command, "$line", line);
    }

    private static void Set(SqliteCommand command, string name, object value)
    {
        if (command.Parameters.Contains(name))
        {
            command.Parameters[name].Value = value;
        }
        else
        {
            command.Parameters.AddWithValue(name, value);
        }
    }
}
