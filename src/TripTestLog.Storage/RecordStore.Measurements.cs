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
            + "instrument, technician, note, source_file_id, source_line, fingerprint, "
            + "found_ir_a, found_isd_a, found_ii_a, found_im_a, found_pickup_a, found_tms) "
            + "VALUES ($d, $at, $stage, $pole, $i, $tripped, $t, $start, $amb, $inst, $tech, $note, $src, $line, $fp, $fir, $fisd, $fii, $fim, $fpk, $ftms)");
        var p = Parameters(insert, "$d", "$at", "$stage", "$pole", "$i", "$tripped", "$t", "$start", "$amb", "$inst", "$tech", "$note", "$src", "$line", "$fp",
            "$fir", "$fisd", "$fii", "$fim", "$fpk", "$ftms");
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
            var found = m.FoundSettings;
            p[15].Value = Db(found?.Ir?.Value);
            p[16].Value = Db(found?.Isd?.Value);
            p[17].Value = Db(found?.Ii?.Value);
            p[18].Value = Db(found?.Im?.Value);
            p[19].Value = Db(found?.Pickup?.Value);
            p[20].Value = Db(found?.Tms);
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

    private long InsertCurveTableRows(SqliteTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(transaction,
            "INSERT INTO curve_table_rows (table_name, multiple, min_s, max_s, source_file_id, source_line) VALUES ($n, $m, $min, $max, $src, $line)");
        var p = Parameters(insert, "$n", "$m", "$min", "$max", "$src", "$line");
        foreach (var (row, line) in file.CurveTableRows)
        {
            p[0].Value = row.Table;
            p[1].Value = row.Point.Multiple.Value;
            p[2].Value = row.Point.Minimum.Value;
            p[3].Value = Db(row.Point.Maximum?.Value);
            p[4].Value = sourceId;
            p[5].Value = line;
            insert.ExecuteNonQuery();
        }

        return file.CurveTableRows.Count;
    }

    private long InsertAmbientTableRows(SqliteTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(transaction,
            "INSERT INTO ambient_table_rows (table_name, ambient_c, current_factor, source_file_id, source_line) VALUES ($n, $t, $f, $src, $line)");
        var p = Parameters(insert, "$n", "$t", "$f", "$src", "$line");
        foreach (var (row, line) in file.AmbientTableRows)
        {
            p[0].Value = row.Table;
            p[1].Value = row.Point.Ambient.Value;
            p[2].Value = row.Point.CurrentFactor;
            p[3].Value = sourceId;
            p[4].Value = line;
            insert.ExecuteNonQuery();
        }

        return file.AmbientTableRows.Count;
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
