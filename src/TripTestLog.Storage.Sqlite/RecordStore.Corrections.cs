using Microsoft.Data.Sqlite;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
    /// <summary>The measurement files of <paramref name="kind"/> stored so far: the candidates a correction may name.</summary>
    internal IEnumerable<EarlierFile> EarlierFiles(SqliteTransaction transaction, RecordKind kind)
    {
        using var select = Command(transaction,
            "SELECT id, file_name, full_path, sha256, imported_at FROM source_files WHERE kind = $kind AND sha256 NOT LIKE 'pending:%' ORDER BY id");
        select.Parameters.AddWithValue("$kind", kind.ToString());
        using var reader = select.ExecuteReader();
        var files = new List<EarlierFile>();
        while (reader.Read())
        {
            files.Add(new EarlierFile(reader.GetInt64(0), reader.GetString(1), reader.GetString(2), reader.GetString(3), MomentText.Read(reader.GetString(4))));
        }

        return files;
    }

    /// <summary>Replaces the corrected records' values and writes every old value to `audit_changes`.</summary>
    internal long ApplyCorrections(SqliteTransaction transaction, MeasurementTable table, IReadOnlyList<Correction> corrections, long sourceId, DateTimeOffset now)
    {
        if (corrections.Count == 0)
        {
            return 0;
        }

        var sets = string.Join(", ", table.Columns.Select((c, i) => $"{c} = $p{i}"));
        using var update = Command(transaction, $"UPDATE {table.Table} SET {sets}, fingerprint = $fp, source_file_id = $src, source_line = $line WHERE id = $id");
        var p = Parameters(update, [.. table.Columns.Select((_, i) => "$p" + i), "$fp", "$src", "$line", "$id"]);
        using var audit = Command(transaction,
            "INSERT INTO audit_changes (table_name, record_id, column_name, old_value, new_value, old_source_file_id, new_source_file_id, changed_at) "
            + "VALUES ($t, $r, $c, $o, $n, $os, $ns, $at)");
        var a = Parameters(audit, "$t", "$r", "$c", "$o", "$n", "$os", "$ns", "$at");
        foreach (var c in corrections)
        {
            for (var i = 0; i < c.New.Values.Length; i++)
            {
                p[i].Value = c.New.Values[i];
            }

            p[^4].Value = c.New.Fingerprint;
            p[^3].Value = sourceId;
            p[^2].Value = c.New.Line;
            p[^1].Value = c.StoredId;
            update.ExecuteNonQuery();
            foreach (var (column, old, value) in c.Changes)
            {
                a[0].Value = table.Table;
                a[1].Value = c.StoredId;
                a[2].Value = column;
                a[3].Value = old;
                a[4].Value = value;
                a[5].Value = c.OldSourceId;
                a[6].Value = sourceId;
                a[7].Value = MomentText.Write(now);
                audit.ExecuteNonQuery();
            }
        }

        return corrections.Count;
    }

    private (long Added, long Updated, long Duplicates) InsertInstruments(SqliteTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(transaction,
            "INSERT OR IGNORE INTO instruments (instrument, kind, serial, calibrated_on, calibration_due, source_file_id, source_line, fingerprint, "
            + InstrumentAccuracyColumns.List + ") VALUES ($i, $k, $s, $on, $due, $src, $line, $fp, $a0, $a1, $a2, $a3, $a4, $a5, $a6, $a7)");
        var p = Parameters(insert, "$i", "$k", "$s", "$on", "$due", "$src", "$line", "$fp", "$a0", "$a1", "$a2", "$a3", "$a4", "$a5", "$a6", "$a7");
        long added = 0;
        foreach (var (c, line) in file.Instruments)
        {
            p[0].Value = c.Instrument;
            p[1].Value = c.Kind;
            p[2].Value = c.Serial;
            p[3].Value = c.CalibratedOn.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);
            p[4].Value = c.CalibrationDue.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);
            p[5].Value = sourceId;
            p[6].Value = line;
            p[7].Value = Fingerprint.Of(c);
            var accuracy = InstrumentAccuracyColumns.Values(c.Accuracy);
            for (var i = 0; i < accuracy.Length; i++)
            {
                p[8 + i].Value = accuracy[i];
            }

            added += insert.ExecuteNonQuery();
        }

        return (added, 0, file.Instruments.Count - added);
    }
}
