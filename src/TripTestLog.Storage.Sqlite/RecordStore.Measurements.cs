using Microsoft.Data.Sqlite;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
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

    internal static SqliteParameter[] Parameters(SqliteCommand command, params string[] names)
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
