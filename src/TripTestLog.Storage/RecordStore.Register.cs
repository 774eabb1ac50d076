using System.Globalization;
using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Records;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    private const string RegisterColumns =
        "site, location, family, curve, rated_current_a, poles, rated_voltage_v, commissioned_on, contact_limit_uohm, make, model, serial";

    private const string RegisterValues =
        "$site, $location, $family, $curve, $rated, $poles, $voltage, $commissioned, $limit, $make, $model, $serial";

    /// <summary>Adds new devices, updates changed ones and keeps a revision for every new or changed entry.</summary>
    private (long Added, long Updated, long Duplicates) ImportRegister(SqliteTransaction transaction, ParsedFile file, long sourceId, DateTimeOffset now)
    {
        var stored = StoredRegister(transaction);
        long added = 0, updated = 0, duplicates = 0;
        var seen = new Dictionary<string, Device>(StringComparer.Ordinal);

        using var insert = Command(transaction,
            $"INSERT INTO devices (asset_tag, {RegisterColumns}, source_file_id, source_line) VALUES ($tag, {RegisterValues}, $source, $line) RETURNING id");
        using var update = Command(transaction,
            "UPDATE devices SET site=$site, location=$location, family=$family, curve=$curve, rated_current_a=$rated, poles=$poles, "
            + "rated_voltage_v=$voltage, commissioned_on=$commissioned, contact_limit_uohm=$limit, make=$make, model=$model, serial=$serial, "
            + "source_file_id=$source, source_line=$line WHERE asset_tag=$tag RETURNING id");
        using var revision = Command(transaction,
            $"INSERT INTO device_revisions (device_id, {RegisterColumns}, source_file_id, source_line, recorded_at) "
            + $"VALUES ($device, {RegisterValues}, $source, $line, $at)");

        foreach (var (device, line) in file.Devices)
        {
            var tag = device.Tag.Value;
            if (seen.TryGetValue(tag, out var earlier))
            {
                // The same row twice is harmless; two different entries for one tag cannot both be right.
                if (earlier == device)
                {
                    duplicates++;
                    continue;
                }

                throw new InvalidOperationException($"register rows for {tag} conflict; Import refuses such files before writing");
            }

            seen[tag] = device;
            SqliteCommand command;
            if (!stored.TryGetValue(tag, out var before))
            {
                command = insert;
                added++;
            }
            else if (before != device)
            {
                command = update;
                updated++;
            }
            else
            {
                continue;
            }

            Bind(command, device, sourceId, line);
            var deviceId = (long)command.ExecuteScalar()!;
            Bind(revision, device, sourceId, line);
            Set(revision, "$device", deviceId);
            Set(revision, "$at", Utc(now));
            revision.ExecuteNonQuery();
        }

        return (added, updated, duplicates);
    }

    private Dictionary<string, Device> StoredRegister(SqliteTransaction transaction)
    {
        using var select = Command(transaction, $"SELECT asset_tag, {RegisterColumns} FROM devices");
        using var reader = select.ExecuteReader();
        var devices = new Dictionary<string, Device>(StringComparer.Ordinal);
        while (reader.Read())
        {
            var device = DeviceMapping.Read(reader);
            devices[device.Tag.Value] = device;
        }

        return devices;
    }

    private static void Bind(SqliteCommand command, Device d, long sourceId, long line)
    {
        Set(command, "$tag", d.Tag.Value);
        Set(command, "$site", d.Site);
        Set(command, "$location", d.Location);
        Set(command, "$family", Codes.Of(d.Family));
        Set(command, "$curve", d.Curve.ToString());
        Set(command, "$rated", d.RatedCurrent.Value);
        Set(command, "$poles", d.Poles);
        Set(command, "$voltage", d.RatedVoltage.Value);
        Set(command, "$commissioned", Db(d.CommissionedOn?.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)));
        Set(command, "$limit", Db(d.ContactLimit?.Value));
        Set(command, "$make", d.Make);
        Set(command, "$model", d.Model);
        Set(command, "$serial", d.Serial);
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
