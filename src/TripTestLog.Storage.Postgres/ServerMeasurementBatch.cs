using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Postgres;

/// <summary>
/// One measurement file going into PostgreSQL. Rows are gathered a few thousand at a time and sent by binary COPY
/// into a temporary staging table of the file's own transaction; at the end, under the server-wide import lock, one
/// INSERT ... SELECT ... ON CONFLICT DO NOTHING moves them into the table, the row fingerprint's unique index
/// answering duplicates (of stored records, and of earlier rows of the file). Disposed before <see cref="Complete"/>,
/// the transaction rolls back and nothing of the file is kept. Memory holds one chunk, whatever the file's size.
/// </summary>
internal sealed class ServerMeasurementBatch : IMeasurementBatch
{
    private const int ChunkRows = 4096;
    private const string Stage = "import_stage";

    private readonly PostgresRecordStore _store;
    private readonly NpgsqlTransaction _transaction;
    private readonly MeasurementTable _table;
    private readonly Dictionary<string, long> _deviceIds;
    private readonly long _sourceId;
    private readonly EarlierFile? _earlier;
    private readonly DateTimeOffset _now;
    private readonly string _copy;
    private readonly List<Prepared> _chunk = new(ChunkRows);
    private long _stored;
    private bool _done;

    public ServerMeasurementBatch(PostgresRecordStore store, RecordKind kind, string name, string path, DateTimeOffset now, string? corrects)
    {
        _store = store;
        _now = now;
        _table = MeasurementTable.For(kind);
        _transaction = store.BeginTransaction();
        try
        {
            _deviceIds = store.DeviceIds(_transaction);
            if (corrects is not null)
            {
                (_earlier, Refusal) = EarlierFiles.Find(store.EarlierFiles(_transaction, kind), corrects, kind);
            }

            _sourceId = store.InsertSourceFile(_transaction, name, path, "pending:" + Guid.NewGuid().ToString("N"), kind, 0, now);
            var staged = string.Join(", ", StagedColumns);
            using (var create = store.ServerCommand($"CREATE TEMP TABLE {Stage} ON COMMIT DROP AS SELECT {staged} FROM {_table.Table} WITH NO DATA", _transaction))
            {
                create.ExecuteNonQuery();
            }

            _copy = $"COPY {Stage} ({staged}) FROM STDIN (FORMAT BINARY)";
        }
        catch
        {
            _transaction.Dispose();
            throw;
        }
    }

    private IEnumerable<string> StagedColumns =>
        _table.Columns.Concat([ServerColumnTypes.OffsetColumn, ServerColumnTypes.HasTimeColumn, "source_line", "fingerprint"]);

    public PreparedRow? Prepare(MeasurementRecord measurement, long line) =>
        _deviceIds.TryGetValue(measurement.Tag.Value, out var device)
            ? new Prepared(MeasurementTable.RowOf(measurement, device, line), measurement.Measurement.TestedAt)
            : null;

    public string? Refusal { get; }

    public IReadOnlyCollection<string> RegisterTags => _deviceIds.Keys;

    public void Add(PreparedRow prepared)
    {
        _stored++;
        _chunk.Add((Prepared)prepared);
        if (_chunk.Count == ChunkRows)
        {
            Flush();
        }
    }

    public BatchResult Complete(string sha256, long rowsRead)
    {
        Flush();
        _store.TakeImportLock(_transaction);
        if (_store.AlreadyImported(_transaction, sha256) is { } earlier)
        {
            _transaction.Rollback();
            _done = true;
            return new BatchResult(false, 0, 0) { EarlierFile = earlier };
        }

        long lastIdBefore = 0;
        var anchors = new List<(long OldLine, long NewLine)>();
        if (_earlier is { } corrected)
        {
            using (var last = _store.ServerCommand($"SELECT COALESCE(MAX(id), 0) FROM {_table.Table}", _transaction))
            {
                lastIdBefore = (long)last.ExecuteScalar()!;
            }

            // A row identical to a record of the corrected file takes that record over: it now cites this file and line.
            using var move = _store.ServerCommand(
                $"WITH m AS (SELECT t.id, t.source_line AS old_line, s.source_line AS new_line FROM {_table.Table} t "
                + $"JOIN (SELECT DISTINCT ON (fingerprint) fingerprint, source_line FROM {Stage} ORDER BY fingerprint, source_line) s "
                + "ON t.fingerprint = s.fingerprint WHERE t.source_file_id = @old), "
                + $"u AS (UPDATE {_table.Table} t SET source_file_id = @src, source_line = m.new_line FROM m WHERE t.id = m.id) "
                + "SELECT old_line, new_line FROM m", _transaction);
            move.Parameters.Add(new NpgsqlParameter("src", NpgsqlDbType.Bigint) { Value = _sourceId });
            move.Parameters.Add(new NpgsqlParameter("old", NpgsqlDbType.Bigint) { Value = corrected.Id });
            using var reader = move.ExecuteReader();
            while (reader.Read())
            {
                anchors.Add((reader.GetInt64(0), reader.GetInt64(1)));
            }
        }

        // In file order, so of two identical rows of one file the first line is the one kept.
        var columns = string.Join(", ", StagedColumns);
        long added;
        using (var insert = _store.ServerCommand(
            $"INSERT INTO {_table.Table} ({columns}, source_file_id) SELECT {columns}, @src FROM {Stage} ORDER BY source_line "
            + "ON CONFLICT (fingerprint) DO NOTHING", _transaction))
        {
            insert.Parameters.Add(new NpgsqlParameter("src", NpgsqlDbType.Bigint) { Value = _sourceId });
            added = insert.ExecuteNonQuery();
        }

        long unchanged = anchors.Count;
        var duplicates = _stored - added - unchanged;
        var correction = _earlier is { } earlierFile ? _store.Correct(_transaction, _table, earlierFile, _sourceId, lastIdBefore, anchors, _deviceIds, _now) : null;
        _store.RecordCounts(_transaction, _sourceId, rowsRead, added + unchanged, duplicates, sha256);
        _transaction.Commit();
        _done = true;
        return new BatchResult(true, added - (correction?.Replaced ?? 0), duplicates) { Correction = correction };
    }

    public void Dispose()
    {
        if (!_done)
        {
            try
            {
                _transaction.Rollback();
            }
            catch (Exception e) when (e is NpgsqlException or InvalidOperationException)
            {
                // The connection is gone or the COPY broke it: the server rolls the transaction back itself.
            }
        }

        _transaction.Dispose();
    }

    private void Flush()
    {
        if (_chunk.Count == 0)
        {
            return;
        }

        using (var writer = _store.Copy(_copy))
        {
            foreach (var row in _chunk)
            {
                writer.StartRow();
                var values = row.Row.Values;
                for (var i = 0; i < values.Length; i++)
                {
                    Write(writer, i == MeasurementTable.TestedAtColumn ? row.When.Local : values[i]);
                }

                Write(writer, row.When.Offset is { } offset ? (short)offset.TotalMinutes : DBNull.Value);
                writer.Write(row.When.HasTime, NpgsqlDbType.Boolean);
                writer.Write(row.Row.Line, NpgsqlDbType.Bigint);
                writer.Write(Convert.FromHexString(row.Row.Fingerprint), NpgsqlDbType.Bytea);
            }

            writer.Complete();
        }

        _chunk.Clear();
    }

    private static void Write(NpgsqlBinaryImporter writer, object value)
    {
        switch (value)
        {
            case DBNull:
                writer.WriteNull();
                break;
            case string s:
                writer.Write(s, NpgsqlDbType.Text);
                break;
            case double d:
                writer.Write(d, NpgsqlDbType.Double);
                break;
            case long l:
                writer.Write(l, NpgsqlDbType.Bigint);
                break;
            case bool b:
                writer.Write(b, NpgsqlDbType.Boolean);
                break;
            case short h:
                writer.Write(h, NpgsqlDbType.Smallint);
                break;
            case DateTime t:
                writer.Write(DateTime.SpecifyKind(t, DateTimeKind.Unspecified), NpgsqlDbType.Timestamp);
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(value), value.GetType().Name, "no column type for this value");
        }
    }

    private sealed record Prepared(MeasurementRow Row, TestedAt When) : PreparedRow(Row.Line);
}
