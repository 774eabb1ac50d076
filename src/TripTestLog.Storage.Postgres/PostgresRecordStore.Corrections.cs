using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    internal NpgsqlTransaction BeginTransaction() => _connection.BeginTransaction();

    internal NpgsqlBinaryImporter Copy(string sql) => _connection.BeginBinaryImport(sql);

    /// <summary>The latest earlier import from the same full path and of the same kind: a corrected file's rows are matched with its lines.</summary>
    internal (long Id, string Name)? EarlierFileOfTheSameName(NpgsqlTransaction transaction, string path, RecordKind kind)
    {
        using var select = Command("SELECT id, full_path FROM source_files WHERE kind = @kind AND full_path = @full ORDER BY id DESC LIMIT 1", transaction);
        select.Parameters.Add(Text("kind", kind.ToString()));
        select.Parameters.Add(Text("full", Path.GetFullPath(path)));
        using var reader = select.ExecuteReader();
        return reader.Read() ? (reader.GetInt64(0), reader.GetString(1)) : null;
    }

    /// <summary>Replaces a corrected record's values and writes every old value to `audit_changes`.</summary>
    internal void ApplyCorrection(NpgsqlTransaction transaction, MeasurementTable table, Correction correction, TestedAt when, long sourceId, DateTimeOffset now)
    {
        var sets = string.Join(", ", table.Columns.Select((c, i) => $"{c} = @p{i}"));
        using var update = Command(
            $"UPDATE {table.Table} SET {sets}, {ServerColumnTypes.OffsetColumn} = @offset, {ServerColumnTypes.HasTimeColumn} = @hastime, "
            + "fingerprint = @fp, source_file_id = @src WHERE id = @id", transaction);
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
        update.Parameters.Add(new NpgsqlParameter("id", NpgsqlDbType.Bigint) { Value = correction.StoredId });
        update.ExecuteNonQuery();

        using var audit = Command(
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
