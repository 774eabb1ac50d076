using Microsoft.Data.Sqlite;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
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
}
