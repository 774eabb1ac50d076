using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    internal NpgsqlTransaction BeginTransaction() => _connection.BeginTransaction();

    internal NpgsqlBinaryImporter Copy(string sql) => _connection.BeginBinaryImport(sql);

    /// <summary>
    /// Pairs the records of the corrected file that no row of the new file held again with the records the new file
    /// added (ids above <paramref name="lastIdBefore"/>; see <see cref="CorrectionPairing"/>): each pair is one record
    /// corrected, its old values kept in the audit table. What is left of the corrected file is kept and reported.
    /// </summary>
    internal CorrectionResult Correct(NpgsqlTransaction transaction, MeasurementTable table, EarlierFile earlier, long sourceId, long lastIdBefore,
        IReadOnlyCollection<(long OldLine, long NewLine)> anchors, IReadOnlyDictionary<string, long> deviceIds, DateTimeOffset now)
    {
        var (pairs, left) = CorrectionPairing.Pair(anchors,
            Lines(transaction, table, "source_file_id = @old", earlier.Id, sourceId, lastIdBefore),
            Lines(transaction, table, "source_file_id = @new AND id > @before", earlier.Id, sourceId, lastIdBefore));
        var columns = table.Columns;
        var tags = deviceIds.ToDictionary(d => d.Value, d => d.Key);
        static string Time(string alias) => $"{alias}.{ServerColumnTypes.OffsetColumn}, {alias}.{ServerColumnTypes.HasTimeColumn}";
        foreach (var (oldId, newId) in pairs)
        {
            Correction correction;
            TestedAt when;
            using (var select = ServerCommand(
                $"SELECT {string.Join(", ", columns.Select(c => "o." + c))}, {Time("o")}, {string.Join(", ", columns.Select(c => "n." + c))}, {Time("n")}, "
                + $"encode(n.fingerprint, 'hex'), n.source_line FROM {table.Table} o, {table.Table} n WHERE o.id = @o AND n.id = @n", transaction))
            {
                select.Parameters.Add(new NpgsqlParameter("o", NpgsqlDbType.Bigint) { Value = oldId });
                select.Parameters.Add(new NpgsqlParameter("n", NpgsqlDbType.Bigint) { Value = newId });
                using var reader = select.ExecuteReader();
                reader.Read();
                var old = Enumerable.Range(0, columns.Length).Select(reader.GetValue).ToArray();
                old[MeasurementTable.TestedAtColumn] = ServerRows.TestedAt(reader, MeasurementTable.TestedAtColumn, columns.Length).ToString();
                var n = columns.Length + 2;
                var values = Enumerable.Range(n, columns.Length).Select(reader.GetValue).ToArray();
                when = ServerRows.TestedAt(reader, n + MeasurementTable.TestedAtColumn, n + columns.Length);
                values[MeasurementTable.TestedAtColumn] = when.ToString();
                var at = n + columns.Length + 2;
                correction = new Correction(new MeasurementRow(values, reader.GetString(at), reader.GetInt64(at + 1)), oldId, old, earlier.Id, earlier.Name, columns)
                {
                    Tags = tags,
                    AddedId = newId,
                };
            }

            using (var delete = ServerCommand($"DELETE FROM {table.Table} WHERE id = @id", transaction))
            {
                delete.Parameters.Add(new NpgsqlParameter("id", NpgsqlDbType.Bigint) { Value = newId });
                delete.ExecuteNonQuery();
            }

            ApplyCorrection(transaction, table, correction, when, sourceId, now);
        }

        return new CorrectionResult(earlier.Name, anchors.Count, pairs.Count, [.. left.Take(100).Select(l => l.Line)], left.Count);
    }

    private List<(long Id, long Line)> Lines(NpgsqlTransaction transaction, MeasurementTable table, string where, long earlierId, long sourceId, long lastIdBefore)
    {
        using var select = ServerCommand($"SELECT id, source_line FROM {table.Table} WHERE {where}", transaction);
        foreach (var (name, value) in new[] { ("old", earlierId), ("new", sourceId), ("before", lastIdBefore) }.Where(p => where.Contains("@" + p.Item1, StringComparison.Ordinal)))
        {
            select.Parameters.Add(new NpgsqlParameter(name, NpgsqlDbType.Bigint) { Value = value });
        }

        using var reader = select.ExecuteReader();
        var lines = new List<(long, long)>();
        while (reader.Read())
        {
            lines.Add((reader.GetInt64(0), reader.GetInt64(1)));
        }

        return lines;
    }

    /// <summary>Replaces a corrected record's values and writes every old value to `audit_changes`.</summary>
    internal void ApplyCorrection(NpgsqlTransaction transaction, MeasurementTable table, Correction correction, TestedAt when, long sourceId, DateTimeOffset now)
    {
        var sets = string.Join(", ", table.Columns.Select((c, i) => $"{c} = @p{i}"));
        using var update = ServerCommand(
            $"UPDATE {table.Table} SET {sets}, {ServerColumnTypes.OffsetColumn} = @offset, {ServerColumnTypes.HasTimeColumn} = @hastime, "
            + "fingerprint = @fp, source_file_id = @src, source_line = @line WHERE id = @id", transaction);
        var values = correction.New.Values;
        for (var i = 0; i < values.Length; i++)
        {
            update.Parameters.Add(i == MeasurementTable.TestedAtColumn
                ? new NpgsqlParameter($"p{i}", NpgsqlDbType.Timestamp) { Value = DateTime.SpecifyKind(when.Local, DateTimeKind.Unspecified) }
                : new NpgsqlParameter($"p{i}", values[i] switch { string => NpgsqlDbType.Text, long => NpgsqlDbType.Bigint, bool => NpgsqlDbType.Boolean, _ => NpgsqlDbType.Double })
                {
                    Value = values[i],
                });
        }

        update.Parameters.Add(new NpgsqlParameter("offset", NpgsqlDbType.Smallint) { Value = when.Offset is { } o ? (short)o.TotalMinutes : DBNull.Value });
        update.Parameters.Add(new NpgsqlParameter("hastime", NpgsqlDbType.Boolean) { Value = when.HasTime });
        update.Parameters.Add(new NpgsqlParameter("fp", NpgsqlDbType.Bytea) { Value = Convert.FromHexString(correction.New.Fingerprint) });
        update.Parameters.Add(new NpgsqlParameter("src", NpgsqlDbType.Bigint) { Value = sourceId });
        update.Parameters.Add(new NpgsqlParameter("line", NpgsqlDbType.Bigint) { Value = correction.New.Line });
        update.Parameters.Add(new NpgsqlParameter("id", NpgsqlDbType.Bigint) { Value = correction.StoredId });
        update.ExecuteNonQuery();

        using var audit = ServerCommand(
            "INSERT INTO audit_changes (table_name, record_id, column_name, old_value, new_value, old_source_file_id, new_source_file_id, changed_at) "
            + "VALUES (@t, @r, @c, @o, @n, @os, @ns, @at)", transaction);
        var a = Parameters(audit, ("t", NpgsqlDbType.Text), ("r", NpgsqlDbType.Bigint), ("c", NpgsqlDbType.Text), ("o", NpgsqlDbType.Text), ("n", NpgsqlDbType.Text),
            ("os", NpgsqlDbType.Bigint), ("ns", NpgsqlDbType.Bigint), ("at", NpgsqlDbType.TimestampTz));
        foreach (var (column, old, value) in correction.Changes)
        {
            a[0].Value = table.Table;
            a[1].Value = correction.StoredId;
            a[2].Value = column;
            a[3].Value = old;
            a[4].Value = value;
            a[5].Value = correction.OldSourceId;
            a[6].Value = sourceId;
            a[7].Value = now.ToUniversalTime();
            audit.ExecuteNonQuery();
        }
    }
}
