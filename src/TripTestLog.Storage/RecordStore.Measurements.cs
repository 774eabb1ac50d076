using Microsoft.Data.Sqlite;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    // One prepared command per file, reused for every row inside the file's transaction: the fast path for bulk import.
    private long InsertMeasurements(SqliteTransaction transaction, MeasurementTable table, IEnumerable<MeasurementRow> rows, long sourceId)
    {
        var names = table.Columns.Select((_, i) => "$p" + i).ToList();
        using var insert = Command(transaction,
            $"INSERT OR IGNORE INTO {table.Table} ({string.Join(", ", table.Columns)}, source_file_id, source_line, fingerprint) "
            + $"VALUES ({string.Join(", ", names)}, $src, $line, $fp)");
        var p = Parameters(insert, [.. names, "$src", "$line", "$fp"]);
        long added = 0;
        foreach (var row in rows)
        {
            for (var i = 0; i < row.Values.Length; i++)
            {
                p[i].Value = row.Values[i];
            }

            p[^3].Value = sourceId;
            p[^2].Value = row.Line;
            p[^1].Value = row.Fingerprint;
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
