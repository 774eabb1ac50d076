using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Records;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    // One prepared command per kind, reused for every row inside the file's transaction: the fast path for bulk import.
    private long InsertTrips(SqliteTransaction transaction, ParsedFile file, long sourceId, Dictionary<string, long> deviceIds)
    {
        using var insert = Command(transaction,
            "INSERT OR IGNORE INTO trip_tests (device_id, tested_at, stage, pole, current_a, tripped, time_s, start, ambient_c, "
            + "instrument, technician, note, source_file_id, source_line, fingerprint) "
            + "VALUES ($d, $at, $stage, $pole, $i, $tripped, $t, $start, $amb, $inst, $tech, $note, $src, $line, $fp)");
        var p = Parameters(insert, "$d", "$at", "$stage", "$pole", "$i", "$tripped", "$t", "$start", "$amb", "$inst", "$tech", "$note", "$src", "$line", "$fp");
        long added = 0;
        foreach (var (m, line) in file.Trips)
        {
            var device = deviceIds[m.Tag.Value];
            p[0].Value = device;
            p[1].Value = m.TestedAt.ToString();
            p[2].Value = Codes.Of(m.Stage);
            p[3].Value = m.Pole.Code;
            p[4].Value = m.Current.Value;
            p[5].Value = m.Outcome.Tripped;
            p[6].Value = m.Outcome.Time.Value;
            p[7].Value = Codes.Of(m.Start);
            p[8].Value = Db(m.Ambient?.Value);
            p[9].Value = m.Instrument;
            p[10].Value = m.Technician;
            p[11].Value = m.Note;
            p[12].Value = sourceId;
            p[13].Value = line;
            p[14].Value = Fingerprint.Of(m, device);
            added += insert.ExecuteNonQuery();
        }

        return added;
    }

    private long InsertContacts(SqliteTransaction transaction, ParsedFile file, long sourceId, Dictionary<string, long> deviceIds)
    {
        using var insert = Command(transaction,
            "INSERT OR IGNORE INTO contact_tests (device_id, tested_at, stage, pole, resistance_uohm, test_current_a, temperature_c, "
            + "instrument, technician, source_file_id, source_line, fingerprint) "
            + "VALUES ($d, $at, $stage, $pole, $r, $i, $temp, $inst, $tech, $src, $line, $fp)");
        var p = Parameters(insert, "$d", "$at", "$stage", "$pole", "$r", "$i", "$temp", "$inst", "$tech", "$src", "$line", "$fp");
        long added = 0;
        foreach (var (m, line) in file.Contacts)
        {
            var device = deviceIds[m.Tag.Value];
            p[0].Value = device;
            p[1].Value = m.TestedAt.ToString();
            p[2].Value = Codes.Of(m.Stage);
            p[3].Value = m.Pole.Code;
            p[4].Value = m.Resistance.Value;
            p[5].Value = m.TestCurrent.Value;
            p[6].Value = Db(m.Temperature?.Value);
            p[7].Value = m.Instrument;
            p[8].Value = m.Technician;
            p[9].Value = sourceId;
            p[10].Value = line;
            p[11].Value = Fingerprint.Of(m, device);
            added += insert.ExecuteNonQuery();
        }

        return added;
    }

    private long InsertInsulations(SqliteTransaction transaction, ParsedFile file, long sourceId, Dictionary<string, long> deviceIds)
    {
        using var insert = Command(transaction,
            "INSERT OR IGNORE INTO insulation_tests (device_id, tested_at, stage, path, test_voltage_v, resistance_mohm, over_range, "
            + "temperature_c, duration_s, source_file_id, source_line, fingerprint) "
            + "VALUES ($d, $at, $stage, $path, $v, $r, $over, $temp, $dur, $src, $line, $fp)");
        var p = Parameters(insert, "$d", "$at", "$stage", "$path", "$v", "$r", "$over", "$temp", "$dur", "$src", "$line", "$fp");
        long added = 0;
        foreach (var (m, line) in file.Insulations)
        {
            var device = deviceIds[m.Tag.Value];
            p[0].Value = device;
            p[1].Value = m.TestedAt.ToString();
            p[2].Value = Codes.Of(m.Stage);
            p[3].Value = m.Path;
            p[4].Value = m.TestVoltage.Value;
            p[5].Value = m.Resistance.Value.Value;
            p[6].Value = m.Resistance.OverRange;
            p[7].Value = Db(m.Temperature?.Value);
            p[8].Value = Db(m.Duration?.Value);
            p[9].Value = sourceId;
            p[10].Value = line;
            p[11].Value = Fingerprint.Of(m, device);
            added += insert.ExecuteNonQuery();
        }

        return added;
    }

    private static SqliteParameter[] Parameters(SqliteCommand command, params string[] names)
    {
        var parameters = names.Select(n =>
        {
            var parameter = command.CreateParameter();
            parameter.ParameterName = n;
            parameter.Value = DBNull.Value;
            command.Parameters.Add(parameter);
            return parameter;
        }).ToArray();

        command.Prepare();
        return parameters;
    }
}
