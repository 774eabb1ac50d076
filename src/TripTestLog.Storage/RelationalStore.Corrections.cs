using System.Data.Common;
using TripTestLog.Application.Import;

namespace TripTestLog.Storage;

public abstract partial class RelationalStore
{
    /// <summary>
    /// Pairs the records of the corrected file that no row of the new file held again with the records the new file
    /// added (ids above <paramref name="lastIdBefore"/>; see <see cref="CorrectionPairing"/>): each pair is one record
    /// corrected, the added copy removed and the old record given the new values, its old values kept in the audit
    /// table. What is left of the corrected file is kept and reported. Only line numbers are held for the whole file.
    /// </summary>
    internal CorrectionResult Correct(DbTransaction transaction, MeasurementTable table, EarlierFile earlier, long sourceId, long lastIdBefore,
        IReadOnlyCollection<(long OldLine, long NewLine)> anchors, IReadOnlyDictionary<string, long> deviceIds, DateTimeOffset now)
    {
        var (pairs, left) = CorrectionPairing.Pair(anchors,
            LinesOf(transaction, table, $"source_file_id = {Dialect.P("file")}", earlier.Id, null),
            LinesOf(transaction, table, $"source_file_id = {Dialect.P("file")} AND id > {Dialect.P("before")}", sourceId, lastIdBefore));
        var columns = table.Columns;
        var n = columns.Length;
        var extra = Dialect.TestTimeColumnCount;
        var tags = deviceIds.ToDictionary(d => d.Value, d => d.Key);
        using var select = Command(
            $"SELECT {string.Join(", ", columns.Select(c => "o." + c))}{Dialect.TestTimeColumns("o")}, "
            + $"{string.Join(", ", columns.Select(c => "n." + c))}{Dialect.TestTimeColumns("n")}, {Dialect.Text("n.fingerprint")}, n.source_line "
            + $"FROM {table.Table} o, {table.Table} n WHERE o.id = {Dialect.P("o")} AND n.id = {Dialect.P("n")}", transaction);
        using var delete = Command($"DELETE FROM {table.Table} WHERE id = {Dialect.P("id")}", transaction);
        foreach (var (oldId, newId) in pairs)
        {
            Correction correction;
            object time;
            Dialect.Set(select, "o", oldId);
            Dialect.Set(select, "n", newId);
            using (var reader = select.ExecuteReader())
            {
                reader.Read();
                var old = Enumerable.Range(0, n).Select(reader.GetValue).ToArray();
                old[MeasurementTable.TestedAtColumn] = Dialect.TestedAtText(reader, MeasurementTable.TestedAtColumn, n);
                var start = n + extra;
                var values = Enumerable.Range(start, n).Select(reader.GetValue).ToArray();
                values[MeasurementTable.TestedAtColumn] = Dialect.TestedAtText(reader, start + MeasurementTable.TestedAtColumn, start + n);
                time = Dialect.TestTime(reader, start + MeasurementTable.TestedAtColumn, start + n);
                var at = 2 * (n + extra);
                correction = new Correction(new MeasurementRow(values, reader.GetString(at), reader.GetInt64(at + 1)), oldId, old, earlier.Id, earlier.Name, columns)
                {
                    Tags = tags,
                    AddedId = newId,
                };
            }

            // The added copy goes first: the old record takes over its fingerprint, which is unique.
            Dialect.Set(delete, "id", newId);
            delete.ExecuteNonQuery();
            ApplyCorrection(transaction, table, correction, time, sourceId, now);
        }

        return new CorrectionResult(earlier.Name, anchors.Count, pairs.Count, [.. left.Take(100).Select(l => l.Line)], left.Count);
    }

    // The (id, line) of the records of a file a condition picks.
    private List<(long Id, long Line)> LinesOf(DbTransaction transaction, MeasurementTable table, string where, long file, long? before)
    {
        using var select = Command($"SELECT id, source_line FROM {table.Table} WHERE {where}", transaction);
        Dialect.Set(select, "file", file);
        if (before is { } b)
        {
            Dialect.Set(select, "before", b);
        }

        using var reader = select.ExecuteReader();
        var lines = new List<(long, long)>();
        while (reader.Read())
        {
            lines.Add((reader.GetInt64(0), reader.GetInt64(1)));
        }

        return lines;
    }

    // Gives a corrected record its new values and writes every old value to `audit_changes`.
    private void ApplyCorrection(DbTransaction transaction, MeasurementTable table, Correction correction, object time, long sourceId, DateTimeOffset now)
    {
        var sets = string.Join(", ", table.Columns.Select((c, i) => $"{c} = {Dialect.P("p" + i)}"));
        using var update = Command(
            $"UPDATE {table.Table} SET {sets}{Dialect.TestTimeSets}, fingerprint = {Dialect.P("fp")}, source_file_id = {Dialect.P("src")}, "
            + $"source_line = {Dialect.P("line")} WHERE id = {Dialect.P("id")}", transaction);
        var values = correction.New.Values;
        for (var i = 0; i < values.Length; i++)
        {
            if (i == MeasurementTable.TestedAtColumn)
            {
                Dialect.SetTestTime(update, "p" + i, time);
            }
            else
            {
                Dialect.SetValue(update, "p" + i, values[i]);
            }
        }

        Dialect.Set(update, "fp", Dialect.FingerprintValue(correction.New.Fingerprint));
        Dialect.Set(update, "src", sourceId);
        Dialect.Set(update, "line", correction.New.Line);
        Dialect.Set(update, "id", correction.StoredId);
        update.ExecuteNonQuery();

        using var audit = Command(
            "INSERT INTO audit_changes (table_name, record_id, column_name, old_value, new_value, old_source_file_id, new_source_file_id, changed_at) "
            + $"VALUES ({string.Join(", ", new[] { "t", "r", "c", "o", "n", "os", "ns", "at" }.Select(Dialect.P))})", transaction);
        foreach (var (column, old, value) in correction.Changes)
        {
            Dialect.Set(audit, "t", table.Table);
            Dialect.Set(audit, "r", correction.StoredId);
            Dialect.Set(audit, "c", column);
            Dialect.Set(audit, "o", old);
            Dialect.Set(audit, "n", value);
            Dialect.Set(audit, "os", correction.OldSourceId);
            Dialect.Set(audit, "ns", sourceId);
            Dialect.Set(audit, "at", Dialect.Moment(now));
            audit.ExecuteNonQuery();
        }
    }
}
