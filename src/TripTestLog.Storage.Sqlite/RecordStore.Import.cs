using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using System.Globalization;
using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
    /// <inheritdoc />
    public IMeasurementBatch BeginMeasurements(RecordKind kind, string name, string path, DateTimeOffset now, string? corrects = null) =>
        new SqliteMeasurementBatch(this, kind, name, path, now, corrects);

    /// <inheritdoc />
    public ImportOutcome StoreSmallFile(ParsedFile file, DateTimeOffset now)
    {
        ArgumentNullException.ThrowIfNull(file);
        using var transaction = BeginWriting();
        if (AlreadyImported(transaction, file.Sha256) is { } earlier)
        {
            return new ImportOutcome(file.Path, file.Kind, ImportStatus.AlreadyImported, file.RowsRead, 0, 0, 0, []) { EarlierFile = earlier };
        }

        var outcome = StoreOther(transaction, file, now);
        transaction.Commit();
        return outcome;
    }

    private ImportOutcome StoreOther(SqliteTransaction transaction, ParsedFile file, DateTimeOffset now)
    {
        var sourceId = InsertSourceFile(transaction, file, now);
        var (added, updated, duplicates) = file.Kind switch
        {
            RecordKind.DeviceRegister => ImportRegister(transaction, file, sourceId, now),
            RecordKind.CurveTable => (InsertCurveTableRows(transaction, file, sourceId), 0, 0),
            RecordKind.AmbientTable => (InsertAmbientTableRows(transaction, file, sourceId), 0, 0),
            _ => InsertInstruments(transaction, file, sourceId),
        };
        RecordCounts(transaction, sourceId, added, duplicates);
        return new ImportOutcome(file.Path, file.Kind, ImportStatus.Imported, file.RowsRead, added, updated, duplicates, []);
    }

    /// <summary>
    /// BEGIN IMMEDIATE takes the write lock up front, so two imports queue instead of failing halfway. SQLite's own busy
    /// wait covers short waits; this loop covers another process's long import, for as long as the lab policy allows,
    /// and says once on stderr what it waits for.
    /// </summary>
    /// <exception cref="TripTestLog.Application.Stores.StoreRefusedException">When the wait runs out: one sentence, nothing written.</exception>
    internal SqliteTransaction BeginWriting()
    {
        if (Opening.Purpose == TripTestLog.Application.Stores.StorePurpose.Read)
        {
            throw new InvalidOperationException("a store opened for reading cannot write");
        }

        var started = DateTime.UtcNow;
        var pause = TimeSpan.FromMilliseconds(50);
        var said = false;
        while (true)
        {
            try
            {
                return _connection.BeginTransaction(deferred: false);
            }
            catch (SqliteException e) when (e.SqliteErrorCode is 5 or 6)
            {
                if (DateTime.UtcNow - started >= Opening.Patience)
                {
                    throw SqliteSchema.Gave(Opening, Path, e);
                }

                if (!said)
                {
                    Opening.Note(SqliteSchema.Waiting(Opening, Path));
                    said = true;
                }

                Thread.Sleep(pause);
                pause = TimeSpan.FromMilliseconds(Math.Min(pause.TotalMilliseconds * 2, 2000));
            }
        }
    }

    /// <summary>The name the file with <paramref name="sha"/> was first imported under, or null when it was not.</summary>
    internal string? AlreadyImported(SqliteTransaction transaction, string sha)
    {
        using var select = Command(transaction, "SELECT file_name FROM source_files WHERE sha256 = $sha ORDER BY id LIMIT 1");
        select.Parameters.AddWithValue("$sha", sha);
        return select.ExecuteScalar() as string;
    }

    internal void RecordCounts(SqliteTransaction transaction, long sourceId, long added, long duplicates)
    {
        using var update = Command(transaction, "UPDATE source_files SET records_added = $a, duplicates = $d WHERE id = $id");
        update.Parameters.AddWithValue("$a", added);
        update.Parameters.AddWithValue("$d", duplicates);
        update.Parameters.AddWithValue("$id", sourceId);
        update.ExecuteNonQuery();
    }

    internal Dictionary<string, long> DeviceIds(SqliteTransaction transaction)
    {
        using var select = Command(transaction, "SELECT asset_tag, id FROM devices");
        using var reader = select.ExecuteReader();
        var ids = new Dictionary<string, long>(AssetTag.Comparer);
        while (reader.Read())
        {
            ids[reader.GetString(0)] = reader.GetInt64(1);
        }

        return ids;
    }

    private long InsertSourceFile(SqliteTransaction transaction, ParsedFile file, DateTimeOffset now) =>
        InsertSourceFile(transaction, file.Path, file.FullPath, file.Sha256, file.Kind!.Value, file.RowsRead, now);

    internal long InsertSourceFile(SqliteTransaction transaction, string name, string path, string sha, RecordKind kind, long rows, DateTimeOffset now)
    {
        using var insert = Command(transaction,
            "INSERT INTO source_files (file_name, full_path, sha256, kind, rows_read, records_added, duplicates, imported_at) "
            + "VALUES ($name, $full, $sha, $kind, $rows, 0, 0, $at) RETURNING id");
        insert.Parameters.AddWithValue("$name", name);
        insert.Parameters.AddWithValue("$full", System.IO.Path.GetFullPath(path));
        insert.Parameters.AddWithValue("$sha", sha);
        insert.Parameters.AddWithValue("$kind", kind.ToString());
        insert.Parameters.AddWithValue("$rows", rows);
        insert.Parameters.AddWithValue("$at", MomentText.Write(now));
        return (long)insert.ExecuteScalar()!;
    }

    internal SqliteCommand Command(SqliteTransaction transaction, string sql)
    {
        var command = _connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        return command;
    }

    private static object Db(double? value) => value is { } v ? v : DBNull.Value;
}
