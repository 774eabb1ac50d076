using TripTestLog.Application.Records;
using TripTestLog.Application.Transfer;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore : IRecordExport
{
    private static readonly StoreExport Export = new(
        alias => string.Join(", ", DeviceMapping.Columns.Split(", ").Select(c => alias + "." + c)),
        _ => "",
        column => column,
        r => TestedAt.Parse(r.GetString(1)));

    /// <inheritdoc />
    public IEnumerable<StoredFile> Files()
    {
        using var select = _connection.CreateCommand();
        select.CommandText = Export.FilesSql;
        using var reader = select.ExecuteReader();
        return StoreExport.Files(reader);
    }

    /// <inheritdoc />
    public IEnumerable<Located<object>> Records(StoredFile file)
    {
        ArgumentNullException.ThrowIfNull(file);
        using var select = _connection.CreateCommand();
        select.CommandText = Export.RecordsSql(file.Kind);
        select.Parameters.AddWithValue("@id", file.Id);
        using var reader = select.ExecuteReader();
        foreach (var record in Export.Records(reader, file))
        {
            yield return record;
        }
    }

    /// <inheritdoc />
    public IEnumerable<StoredChange> Changes()
    {
        using var select = _connection.CreateCommand();
        select.CommandText = Export.ChangesSql;
        using var reader = select.ExecuteReader();
        return StoreExport.Changes(reader);
    }

    /// <inheritdoc />
    public long AddChanges(IEnumerable<StoredChange> changes)
    {
        ArgumentNullException.ThrowIfNull(changes);
        using var transaction = BeginWriting();
        long added = 0;
        foreach (var change in changes)
        {
            using var insert = Command(transaction,
                $"INSERT INTO audit_changes (table_name, record_id, column_name, old_value, new_value, old_source_file_id, new_source_file_id, changed_at) "
                + $"SELECT $t, r.id, $c, $o, $n, fo.id, fn.id, $at FROM {MeasurementTable.Checked(change.Table)} r, source_files fo, source_files fn "
                + "WHERE r.fingerprint = $fp AND fo.sha256 = $os AND fn.sha256 = $ns AND NOT EXISTS (SELECT 1 FROM audit_changes a "
                + "WHERE a.table_name = $t AND a.record_id = r.id AND a.column_name = $c AND a.old_value = $o AND a.new_value = $n AND a.changed_at = $at)");
            insert.Parameters.AddWithValue("$t", change.Table);
            insert.Parameters.AddWithValue("$c", change.Column);
            insert.Parameters.AddWithValue("$o", change.Old);
            insert.Parameters.AddWithValue("$n", change.New);
            insert.Parameters.AddWithValue("$at", MomentText.Write(change.ChangedAt));
            insert.Parameters.AddWithValue("$fp", change.RecordFingerprint);
            insert.Parameters.AddWithValue("$os", change.OldFileSha256);
            insert.Parameters.AddWithValue("$ns", change.NewFileSha256);
            added += insert.ExecuteNonQuery();
        }

        transaction.Commit();
        return added;
    }
}
