using Microsoft.Data.Sqlite;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>
/// One measurement file going into SQLite: BEGIN IMMEDIATE, a source row with a placeholder hash, each row written by
/// a prepared INSERT OR IGNORE reused for the whole file (the fingerprint's unique index answers duplicates), then the
/// real hash and counts and COMMIT; or ROLLBACK when disposed first. Holds nothing per row, so memory does not grow
/// with the file. (Multi-row statements of 32 rows were tried and measured slower here.)
/// </summary>
internal sealed class SqliteMeasurementBatch : IMeasurementBatch
{
    private readonly RecordStore _store;
    private readonly SqliteTransaction _transaction;
    private readonly MeasurementTable _table;
    private readonly Dictionary<string, long> _deviceIds;
    private readonly long _sourceId;
    private readonly int _shortColumns;
    private readonly Statement _full;
    private readonly Statement _short;
    private readonly (long Id, string Name)? _earlier;
    private readonly SqliteCommand? _lookup;
    private readonly string _path;
    private readonly DateTimeOffset _now;
    private Correction? _pending;
    private long _stored;
    private long _added;
    private bool _done;

    public SqliteMeasurementBatch(RecordStore store, RecordKind kind, string name, string path, DateTimeOffset now)
    {
        _store = store;
        _path = name;
        _now = now;
        _table = MeasurementTable.For(kind);

        // Foreign keys are not checked row by row here: every device id comes from the register read inside this
        // transaction and the source id from the row it just wrote, and `verify` runs SQLite's foreign-key check.
        // (The pragma is ignored inside a transaction, so it is set before it begins and restored when the batch ends.)
        store.ForeignKeys(false);
        _transaction = store.BeginWriting();
        try
        {
            _deviceIds = store.DeviceIds(_transaction);
            _earlier = store.EarlierFileOfTheSameName(_transaction, path, kind);
            _sourceId = store.InsertSourceFile(_transaction, name, path, "pending:" + Guid.NewGuid().ToString("N"), kind, 0, now);

            // Most rows leave the trailing optional columns (settings found on the device) empty; statements without
            // them bind fewer parameters per row.
            _shortColumns = _table.Columns.Length - _table.TrailingOptional;
            _full = Insert(_table.Columns.Length);
            _short = Insert(_shortColumns);
            if (_earlier is { } earlier)
            {
                _lookup = store.Command(_transaction,
                    $"SELECT id, {string.Join(", ", _table.Columns)} FROM {_table.Table} WHERE source_file_id = $src AND source_line = $line");
                RecordStore.Parameters(_lookup, "$src", "$line")[0].Value = earlier.Id;
            }
        }
        catch
        {
            _transaction.Dispose();
            store.ForeignKeys(true);
            throw;
        }
    }

    public PreparedRow? Prepare(object measurement, long line) =>
        _deviceIds.TryGetValue(TagOf(measurement).Value, out var device) ? new Prepared(MeasurementTable.RowOf(measurement, device, line)) : null;

    public RowAnswer Add(PreparedRow prepared)
    {
        var row = ((Prepared)prepared).Row;
        if (Correction(row) is { } correction)
        {
            _pending = correction;
            var problem = correction.Problem(_path);
            return new RowAnswer(RowAnswerKind.Conflict, problem.Column, problem.Reason);
        }

        _stored++;
        _added += Execute(IsShort(row) ? _short : _full, row);
        return RowAnswer.Stored;
    }

    public void Replace(PreparedRow prepared)
    {
        if (_pending is not { } correction || correction.New.Line != prepared.Line)
        {
            throw new InvalidOperationException($"line {prepared.Line} was not answered with a conflict");
        }

        _store.ApplyCorrections(_transaction, _table, [correction], _sourceId, _now);
        _pending = null;
    }

    public BatchResult Complete(string sha256, long rowsRead, long replaced)
    {
        var duplicates = _stored - _added;
        if (_store.AlreadyImported(_transaction, sha256) is { } earlier)
        {
            _transaction.Rollback();
            _done = true;
            return new BatchResult(false, 0, 0) { EarlierFile = earlier };
        }

        using var update = _store.Command(_transaction,
            "UPDATE source_files SET sha256 = $sha, rows_read = $rows, records_added = $a, duplicates = $d WHERE id = $id");
        update.Parameters.AddWithValue("$sha", sha256);
        update.Parameters.AddWithValue("$rows", rowsRead);
        update.Parameters.AddWithValue("$a", _added + replaced);
        update.Parameters.AddWithValue("$d", duplicates);
        update.Parameters.AddWithValue("$id", _sourceId);
        update.ExecuteNonQuery();
        _transaction.Commit();
        _done = true;
        return new BatchResult(true, _added, duplicates);
    }

    public void Dispose()
    {
        foreach (var statement in new[] { _full, _short })
        {
            statement.Command.Dispose();
        }

        _lookup?.Dispose();
        if (!_done)
        {
            _transaction.Rollback();
        }

        _transaction.Dispose();
        _store.ForeignKeys(true);
    }

    private bool IsShort(MeasurementRow row)
    {
        for (var i = _shortColumns; i < row.Values.Length; i++)
        {
            if (row.Values[i] is not DBNull)
            {
                return false;
            }
        }

        return true;
    }

    private long Execute(Statement statement, MeasurementRow row)
    {
        var p = statement.Parameters;
        for (var i = 0; i < statement.Columns; i++)
        {
            p[i].Value = row.Values[i];
        }

        p[^3].Value = _sourceId;
        p[^2].Value = row.Line;
        p[^1].Value = row.Fingerprint;
        return statement.Command.ExecuteNonQuery();
    }

    private Statement Insert(int columns)
    {
        var used = _table.Columns.Take(columns).Concat(["source_file_id", "source_line", "fingerprint"]).ToList();
        var names = used.Select((_, c) => "$p" + c).ToList();
        var command = _store.Command(_transaction,
            $"INSERT OR IGNORE INTO {_table.Table} ({string.Join(", ", used)}) VALUES ({string.Join(", ", names)})");
        return new Statement(command, RecordStore.Parameters(command, [.. names]), columns);
    }

    private Correction? Correction(MeasurementRow row)
    {
        if (_lookup is null || _earlier is not { } earlier)
        {
            return null;
        }

        _lookup.Parameters["$line"].Value = row.Line;
        using var reader = _lookup.ExecuteReader();
        if (!reader.Read())
        {
            return null;
        }

        var values = new object[_table.Columns.Length];
        for (var i = 0; i < values.Length; i++)
        {
            values[i] = reader.GetValue(i + 1);
        }

        var correction = new Correction(row, reader.GetInt64(0), values, earlier.Id, earlier.Name, _table.Columns);
        return correction.Changes.Any() ? correction : null;
    }

    private static AssetTag TagOf(object record) =>
        record is IMeasurement m ? m.Tag : throw new ArgumentOutOfRangeException(nameof(record), record.GetType().Name, "not a measurement");

    // The device dictionary is only read once the batch has begun, so preparing rows on another thread is safe.
    private sealed record Prepared(MeasurementRow Row) : PreparedRow(Row.Line);

    private sealed record Statement(SqliteCommand Command, SqliteParameter[] Parameters, int Columns);
}
