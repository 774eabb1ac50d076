using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
    private const string RegisterColumns = DeviceMapping.Columns;

    private const string RegisterValues = DeviceMapping.Parameters;

    /// <summary>The register import (<see cref="RegisterMerge"/>) with SQLite's statements.</summary>
    private (long Added, long Updated, long Duplicates) ImportRegister(SqliteTransaction transaction, ParsedFile file, long sourceId, DateTimeOffset now)
    {
        using var select = Command(transaction,
            $"SELECT d.id, d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))} "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id ORDER BY r.id");
        Dictionary<string, (long Id, List<Device> Revisions)> stored;
        using (var reader = select.ExecuteReader())
        {
            stored = RegisterMerge.Stored(reader);
        }

        using var insert = Command(transaction,
            $"INSERT INTO devices (asset_tag, {RegisterColumns}, source_file_id, source_line) VALUES ($tag, {RegisterValues}, $source, $line) RETURNING id");
        using var revision = Command(transaction,
            $"INSERT INTO device_revisions (device_id, {RegisterColumns}, source_file_id, source_line, recorded_at) "
            + $"VALUES ($device, {RegisterValues}, $source, $line, $at)");
        using var update = Command(transaction,
            $"UPDATE devices SET ({RegisterColumns}, source_file_id, source_line) = ({RegisterValues}, $source, $line) WHERE asset_tag = $tag COLLATE NOCASE");
        return RegisterMerge.Run(file.Devices, stored,
            (device, line) =>
            {
                Bind(insert, device, sourceId, line);
                return (long)insert.ExecuteScalar()!;
            },
            (device, id, line) =>
            {
                Bind(revision, device, sourceId, line);
                Set(revision, "$device", id);
                Set(revision, "$at", MomentText.Write(now));
                revision.ExecuteNonQuery();
            },
            (device, line) =>
            {
                Bind(update, device, sourceId, line);
                update.ExecuteNonQuery();
            });
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
