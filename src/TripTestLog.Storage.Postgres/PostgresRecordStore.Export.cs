using NpgsqlTypes;
using TripTestLog.Application.Records;
using TripTestLog.Application.Transfer;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore : IRecordExport
{
    private static readonly StoreExport Export = new(
        ServerSql.RegisterSelect,
        alias => ", " + TestTime(alias),
        column => column switch
        {
            "calibrated_on" or "calibration_due" => $"to_char({column}, 'YYYY-MM-DD')",
            "t.fingerprint" => "encode(t.fingerprint, 'hex')",
            _ => $"to_char({column} AT TIME ZONE 'UTC', 'YYYY-MM-DD\"T\"HH24:MI:SS.US\"Z\"')",
        },
        r => ServerRows.TestedAt(r, 1, r.FieldCount - 2));

    /// <inheritdoc />
    public IEnumerable<StoredFile> Files()
    {
        using var select = Command(Export.FilesSql);
        using var reader = select.ExecuteReader();
        return StoreExport.Files(reader);
    }

    /// <inheritdoc />
    public IEnumerable<Located<object>> Records(StoredFile file)
    {
        ArgumentNullException.ThrowIfNull(file);

        // A connection of its own: the records stream while this store may be written to on its main connection.
        using var connection = Connect();
        using var select = new Npgsql.NpgsqlCommand(Export.RecordsSql(file.Kind), connection);
        select.Parameters.Add(new Npgsql.NpgsqlParameter("id", NpgsqlDbType.Bigint) { Value = file.Id });
        using var reader = select.ExecuteReader();
        foreach (var record in Export.Records(reader, file))
        {
            yield return record;
        }
    }

    /// <inheritdoc />
    public IEnumerable<StoredChange> Changes()
    {
        using var select = Command(Export.ChangesSql);
        using var reader = select.ExecuteReader();
        return StoreExport.Changes(reader);
    }

    /// <inheritdoc />
    public long AddChanges(IEnumerable<StoredChange> changes)
    {
        ArgumentNullException.ThrowIfNull(changes);
        using var transaction = BeginTransaction();
        TakeImportLock(transaction);
        long added = 0;
        foreach (var change in changes)
        {
            using var insert = Command(
                "INSERT INTO audit_changes (table_name, record_id, column_name, old_value, new_value, old_source_file_id, new_source_file_id, changed_at) "
                + $"SELECT @t, r.id, @c, @o, @n, fo.id, fn.id, @at FROM {MeasurementTable.Checked(change.Table)} r, source_files fo, source_files fn "
                + "WHERE r.fingerprint = decode(@fp, 'hex') AND fo.sha256 = @os AND fn.sha256 = @ns AND NOT EXISTS (SELECT 1 FROM audit_changes a "
                + "WHERE a.table_name = @t AND a.record_id = r.id AND a.column_name = @c AND a.old_value = @o AND a.new_value = @n AND a.changed_at = @at)",
                transaction);
            insert.Parameters.Add(Text("t", change.Table));
            insert.Parameters.Add(Text("c", change.Column));
            insert.Parameters.Add(Text("o", change.Old));
            insert.Parameters.Add(Text("n", change.New));
            insert.Parameters.Add(new Npgsql.NpgsqlParameter("at", NpgsqlDbType.TimestampTz) { Value = change.ChangedAt.ToUniversalTime() });
            insert.Parameters.Add(Text("fp", change.RecordFingerprint));
            insert.Parameters.Add(Text("os", change.OldFileSha256));
            insert.Parameters.Add(Text("ns", change.NewFileSha256));
            added += insert.ExecuteNonQuery();
        }

        transaction.Commit();
        return added;
    }
}
