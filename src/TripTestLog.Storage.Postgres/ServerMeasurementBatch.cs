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
    private readonly (long Id, string Name)? _earlier;
    private readonly NpgsqlCommand? _lookup;
    private readonly string _name;
    private readonly DateTimeOffset _now;
    private readonly string _copy;
    private readonly List<Prepared> _chunk = new(ChunkRows);
    private Correction? _pending;
    private long _stored;
    private bool _done;

    public ServerMeasurementBatch(PostgresRecordStore store, RecordKind kind, string name, string path, DateTimeOffset now)
    {
        _store = store;
        _name = name;
        _now = now;
        _table = MeasurementTable.For(kind);
        _transaction = store.BeginTransaction();
        try
        {
            _deviceIds = store.DeviceIds(_transaction);
            _earlier = store.EarlierFileOfTheSameName(_transaction, path, kind);
            _sourceId = store.InsertSourceFile(_transaction, name, path, "pending:" + Guid.NewGuid().ToString("N"), kind, 0, now);
            var staged = string.Join(", ", StagedColumns);
            using (var create = store.Command($"CREATE TEMP TABLE {Stage} ON COMMIT DROP AS SELECT {staged} FROM {_table.Table} WITH NO DATA", _transaction))
            {
                create.ExecuteNonQuery();
            }

            _copy = $"COPY {Stage} ({staged}) FROM STDIN (FORMAT BINARY)";
            if (_earlier is { } earlier)
            {
                _lookup = store.Command(
                    $"SELECT id, {string.Join(", ", _table.Columns)}, {ServerColumnTypes.OffsetColumn}, {ServerColumnTypes.HasTimeColumn} "
                    + $"FROM {_table.Table} WHERE source_file_id = @src AND source_line = @line", _transaction);
                _lookup.Parameters.Add(new NpgsqlParameter("src", NpgsqlDbType.Bigint) { Value = earlier.Id });
                _lookup.Parameters.Add(new NpgsqlParameter("line", NpgsqlDbType.Bigint));
            }
        }
        catch
        {
            _transaction.Dispose();
            throw;
        }
    }

    private IEnumerable<string> StagedColumns =>
        _table.Columns.Concat([ServerColumnTypes.OffsetColumn, ServerColumnTypes.HasTimeColumn, "source_line", "fingerprint"]);

    public PreparedRow? Prepare(object measurement, long line) =>
        measurement is IMeasurement m && _deviceIds.TryGetValue(m.Tag.Value, out var device)
            ? new Prepared(MeasurementTable.RowOf(measurement, device, line), m.TestedAt)
            : null;

    public RowAnswer Add(PreparedRow prepared)
    {
        var row = (Prepared)prepared;
        if (Correction(row.Row) is { } correction)
        {
            _pending = correction;
            var problem = correction.Problem(_name);
            return new RowAnswer(RowAnswerKind.Conflict, problem.Column, problem.Reason);
        }

        _stored++;
        _chunk.Add(row);
        if (_chunk.Count == ChunkRows)
        {
            Flush();
        }

        return RowAnswer.Stored;
    }

    public void Replace(PreparedRow prepared)
    {
        if (_pending is not { } correction || correction.New.Line != prepared.Line)
        {
            throw new InvalidOperationException($"line {prepared.Line} was not answered with a conflict");
        }

        _store.ApplyCorrection(_transaction, _table, correction, ((Prepared)prepared).When, _sourceId, _now);
        _pending = null;
    }

    public BatchResult Complete(string sha256, long rowsRead, long replaced)
    {
        Flush();
        _store.TakeImportLock(_transaction);
        if (_store.AlreadyImported(_transaction, sha256) is { } earlier)
        {
            _transaction.Rollback();
            _done = true;
            return new BatchResult(false, 0, 0) { EarlierFile = earlier };
        }

        // In file order, so of two identical rows of one file the first line is the one kept.
        var columns = string.Join(", ", StagedColumns);
        long added;
        using (var insert = _store.Command(
            $"INSERT INTO {_table.Table} ({columns}, source_file_id) SELECT {columns}, @src FROM {Stage} ORDER BY source_line "
            + "ON CONFLICT (fingerprint) DO NOTHING", _transaction))
        {
            insert.Parameters.Add(new NpgsqlParameter("src", NpgsqlDbType.Bigint) { Value = _sourceId });
            added = insert.ExecuteNonQuery();
        }

        var duplicates = _stored - added;
        _store.RecordCounts(_transaction, _sourceId, rowsRead, added + replaced, duplicates, sha256);
        _transaction.Commit();
        _done = true;
        return new BatchResult(true, added, duplicates);
    }

    public void Dispose()
    {
        _lookup?.Dispose();
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

    private Correction? Correction(MeasurementRow row)
    {
        if (_lookup is null || _earlier is not { } earlier)
        {
            return null;
        }

        _lookup.Parameters["line"].Value = row.Line;
        using var reader = _lookup.ExecuteReader();
        if (!reader.Read())
        {
            return null;
        }

        // The stored values as the SQLite store holds them, so a correction compares and reads the same on both.
        var values = new object[_table.Columns.Length];
        for (var i = 0; i < values.Length; i++)
        {
            values[i] = reader.GetValue(i + 1);
        }

        // The lookup selects id first and the test time's two other parts last.
        values[MeasurementTable.TestedAtColumn] = ServerRows.TestedAt(reader, MeasurementTable.TestedAtColumn + 1, _table.Columns.Length + 1).ToString();
        var correction = new Correction(row, reader.GetInt64(0), values, earlier.Id, earlier.Name, _table.Columns);
        return correction.Changes.Any() ? correction : null;
    }

    private sealed record Prepared(MeasurementRow Row, TestedAt When) : PreparedRow(Row.Line);
}
