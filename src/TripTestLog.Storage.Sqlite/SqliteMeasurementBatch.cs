using Microsoft.Data.Sqlite;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Sqlite;

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
    private readonly EarlierFile? _earlier;
    private readonly SqliteCommand? _find;
    private readonly SqliteCommand? _move;
    private readonly long _lastIdBefore;
    private readonly DateTimeOffset _now;
    private readonly List<(long OldLine, long NewLine)> _anchors = [];
    private long _stored;
    private long _added;
    private long _unchanged;
    private bool _done;

    public SqliteMeasurementBatch(RecordStore store, RecordKind kind, string name, string path, DateTimeOffset now, string? corrects)
    {
        _store = store;
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
            if (corrects is not null)
            {
                (_earlier, Refusal) = EarlierFiles.Find(store.EarlierFiles(_transaction, kind), corrects, kind);
                using var last = store.NativeCommand($"SELECT COALESCE(MAX(id), 0) FROM {_table.Table}", _transaction);
                _lastIdBefore = (long)last.ExecuteScalar()!;
            }

            _sourceId = store.InsertSourceFile(_transaction, name, path, "pending:" + Guid.NewGuid().ToString("N"), kind, 0, now);

            // Most rows leave the trailing optional columns (settings found on the device) empty; statements without
            // them bind fewer parameters per row.
            _shortColumns = _table.Columns.Length - _table.TrailingOptional;
            _full = Insert(_table.Columns.Length);
            _short = Insert(_shortColumns);
            if (_earlier is { } earlier)
            {
                // A row identical to a record of the corrected file takes that record over: it now cites this file and line.
                _find = store.NativeCommand($"SELECT id, source_line FROM {_table.Table} WHERE fingerprint = $fp AND source_file_id = $old", _transaction);
                Unbound(_find, "$fp", "$old")[1].Value = earlier.Id;
                _move = store.NativeCommand($"UPDATE {_table.Table} SET source_file_id = $new, source_line = $line WHERE id = $id", _transaction);
                Unbound(_move, "$new", "$line", "$id")[0].Value = _sourceId;
            }
        }
        catch
        {
            _transaction.Dispose();
            store.ForeignKeys(true);
            throw;
        }
    }

    public PreparedRow? Prepare(MeasurementRecord measurement, long line) =>
        _deviceIds.TryGetValue(measurement.Tag.Value, out var device) ? new Prepared(MeasurementTable.RowOf(measurement, device, line)) : null;

    public string? Refusal { get; }

    public IReadOnlyCollection<string> RegisterTags => _deviceIds.Keys;

    public void Add(PreparedRow prepared)
    {
        var row = ((Prepared)prepared).Row;
        _stored++;
        var added = Execute(IsShort(row) ? _short : _full, row);
        _added += added;
        if (added == 0 && _find is not null && _move is not null)
        {
            _find.Parameters["$fp"].Value = row.Fingerprint;
            long id, oldLine;
            using (var reader = _find.ExecuteReader())
            {
                if (!reader.Read())
                {
                    return;
                }

                (id, oldLine) = (reader.GetInt64(0), reader.GetInt64(1));
            }

            _move.Parameters["$line"].Value = row.Line;
            _move.Parameters["$id"].Value = id;
            _move.ExecuteNonQuery();
            _anchors.Add((oldLine, row.Line));
            _unchanged++;
        }
    }

    public BatchResult Complete(string sha256, long rowsRead)
    {
        if (_store.AlreadyImported(_transaction, sha256) is { } earlier)
        {
            _transaction.Rollback();
            _done = true;
            return new BatchResult(false, 0, 0) { EarlierFile = earlier };
        }

        var correction = _earlier is { } corrected ? _store.Correct(_transaction, _table, corrected, _sourceId, _lastIdBefore, _anchors, _deviceIds, _now) : null;
        var added = _added - (correction?.Replaced ?? 0);
        var duplicates = _stored - _added - _unchanged;
        _store.RecordCounts(_transaction, _sourceId, rowsRead, _added + _unchanged, duplicates, sha256);
        _transaction.Commit();
        _done = true;
        return new BatchResult(true, added, duplicates) { Correction = correction };
    }

    public void Dispose()
    {
        foreach (var statement in new[] { _full, _short })
        {
            statement.Command.Dispose();
        }

        _find?.Dispose();
        _move?.Dispose();
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
        var command = _store.NativeCommand($"INSERT OR IGNORE INTO {_table.Table} ({string.Join(", ", used)}) VALUES ({string.Join(", ", names)})", _transaction);
        return new Statement(command, Unbound(command, [.. names]), columns);
    }

    // Adds the named parameters, empty, and prepares the statement: the rows then only set values by position.
    private static SqliteParameter[] Unbound(SqliteCommand command, params string[] names)
    {
        var parameters = names.Select(n =>
        {
            var parameter = command.CreateParameter();
            parameter.ParameterName = n;
            parameter.Value = DBNull.Value;
            command.Parameters.Add(parameter);
            return parameter;
        }).ToArray();
        command.Prepare();
        return parameters;
    }

    // The device dictionary is only read once the batch has begun, so preparing rows on another thread is safe.
    private sealed record Prepared(MeasurementRow Row) : PreparedRow(Row.Line);

    private sealed record Statement(SqliteCommand Command, SqliteParameter[] Parameters, int Columns);
}
