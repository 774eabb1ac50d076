using TripTestLog.Application.Records;
using TripTestLog.Application.Transfer;

namespace TripTestLog.Storage;

public abstract partial class RelationalStore : IRecordExport
{
    private StoreExport? _export;

    private StoreExport Export => _export ??= new(Dialect);

    /// <inheritdoc />
    public IEnumerable<StoredFile> Files()
    {
        using var select = Command(Export.FilesSql);
        using var reader = select.ExecuteReader();
        return StoreExport.Files(reader);
    }

    /// <inheritdoc />
    public IEnumerable<Located<ReadRecord>> Records(StoredFile file)
    {
        ArgumentNullException.ThrowIfNull(file);

        // One read scope while the records stream: on SQLite it holds a read transaction on the store's connection, so
        // nothing may write through this store until the enumeration ends (transfer only reads its source).
        ReadingMany();
        using var scope = BeginRead();
        using var select = scope.Query(Export.RecordsSql(file.Kind));
        Dialect.Set(select, "id", file.Id);
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
        using var transaction = BeginWrite();
        var (t, c, o, n, at) = (Dialect.P("t"), Dialect.P("c"), Dialect.P("o"), Dialect.P("n"), Dialect.P("at"));
        long added = 0;
        foreach (var change in changes)
        {
            using var insert = Command(
                "INSERT INTO audit_changes (table_name, record_id, column_name, old_value, new_value, old_source_file_id, new_source_file_id, changed_at) "
                + $"SELECT {t}, r.id, {c}, {o}, {n}, fo.id, fn.id, {at} FROM {MeasurementTable.Checked(change.Table)} r, source_files fo, source_files fn "
                + $"WHERE r.fingerprint = {Dialect.Fingerprint(Dialect.P("fp"))} AND fo.sha256 = {Dialect.P("os")} AND fn.sha256 = {Dialect.P("ns")} "
                + "AND NOT EXISTS (SELECT 1 FROM audit_changes a "
                + $"WHERE a.table_name = {t} AND a.record_id = r.id AND a.column_name = {c} AND a.old_value = {o} AND a.new_value = {n} AND a.changed_at = {at})",
                transaction);
            Dialect.Set(insert, "t", change.Table);
            Dialect.Set(insert, "c", change.Column);
            Dialect.Set(insert, "o", change.Old);
            Dialect.Set(insert, "n", change.New);
            Dialect.Set(insert, "at", Dialect.Moment(change.ChangedAt));
            Dialect.Set(insert, "fp", change.RecordFingerprint);
            Dialect.Set(insert, "os", change.OldFileSha256);
            Dialect.Set(insert, "ns", change.NewFileSha256);
            added += insert.ExecuteNonQuery();
        }

        transaction.Commit();
        return added;
    }
}
