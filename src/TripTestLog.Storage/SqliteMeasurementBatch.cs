using Microsoft.Data.Sqlite;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>
/// One measurement file going into SQLite: BEGIN IMMEDIATE, a source row with a placeholder hash, one prepared
/// INSERT OR IGNORE reused for every row (the fingerprint's unique index answers duplicates), then the real hash and
/// counts and COMMIT; or ROLLBACK when disposed first. Holds nothing per row, so memory does not grow with the file.
/// </summary>
internal sealed class SqliteMeasurementBatch : IMeasurementBatch
{
    private readonly RecordStore _store;
    private readonly SqliteTransaction _transaction;
    private readonly MeasurementTable _table;
    private readonly Dictionary<string, long> _deviceIds;
    private readonly long _sourceId;
    private readonly SqliteCommand _insert;
    private readonly SqliteParameter[] _parameters;
    private readonly (long Id, string Name)? _earlier;
    private readonly SqliteCommand? _lookup;
    private readonly string _path;
    private readonly DateTimeOffset _now;
    private Correction? _pending;
    private bool _done;

    public SqliteMeasurementBatch(RecordStore store, RecordKind kind, string path, DateTimeOffset now)
    {
        _store = store;
        _path = path;
        _now = now;
        _table = MeasurementTable.For(kind);
        _transaction = store.BeginWriting();
        try
        {
            _deviceIds = store.DeviceIds(_transaction);
            _earlier = store.EarlierFileOfTheSameName(_transaction, path, kind);
            _sourceId = store.InsertSourceFile(_transaction, path, "pending:" + Guid.NewGuid().ToString("N"), kind, 0, now);
            var names = _table.Columns.Select((_, i) => "$p" + i).ToList();
            _insert = store.Command(_transaction,
                $"INSERT OR IGNORE INTO {_table.Table} ({string.Join(", ", _table.Columns)}, source_file_id, source_line, fingerprint) "
                + $"VALUES ({string.Join(", ", names)}, $src, $line, $fp)");
            _parameters = RecordStore.Parameters(_insert, [.. names, "$src", "$line", "$fp"]);
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
            throw;
        }
    }

    public bool Knows(AssetTag tag) => _deviceIds.ContainsKey(tag.Value);

    public RowAnswer Add(object measurement, long line)
    {
        var row = MeasurementTable.RowOf(measurement, _deviceIds[TagOf(measurement).Value], line);
        if (Correction(row) is { } correction)
        {
            _pending = correction;
            var problem = correction.Problem(_path);
            return new RowAnswer(RowAnswerKind.Conflict, problem.Column, problem.Reason);
        }

        for (var i = 0; i < row.Values.Length; i++)
        {
            _parameters[i].Value = row.Values[i];
        }

        _parameters[^3].Value = _sourceId;
        _parameters[^2].Value = row.Line;
        _parameters[^1].Value = row.Fingerprint;
        return _insert.ExecuteNonQuery() == 1 ? RowAnswer.Added : RowAnswer.Duplicate;
    }

    public void Replace(object measurement, long line)
    {
        if (_pending is not { } correction || correction.New.Line != line)
        {
            throw new InvalidOperationException($"line {line} was not answered with a conflict");
        }

        _store.ApplyCorrections(_transaction, _table, [correction], _sourceId, _now);
        _pending = null;
    }

    public bool Complete(string sha256, long rowsRead, long added, long duplicates)
    {
        if (_store.AlreadyImported(_transaction, sha256))
        {
            _transaction.Rollback();
            _done = true;
            return false;
        }

        using var update = _store.Command(_transaction,
            "UPDATE source_files SET sha256 = $sha, rows_read = $rows, records_added = $a, duplicates = $d WHERE id = $id");
        update.Parameters.AddWithValue("$sha", sha256);
        update.Parameters.AddWithValue("$rows", rowsRead);
        update.Parameters.AddWithValue("$a", added);
        update.Parameters.AddWithValue("$d", duplicates);
        update.Parameters.AddWithValue("$id", _sourceId);
        update.ExecuteNonQuery();
        _transaction.Commit();
        _done = true;
        return true;
    }

    public void Dispose()
    {
        _insert.Dispose();
        _lookup?.Dispose();
        if (!_done)
        {
            _transaction.Rollback();
        }

        _transaction.Dispose();
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

    private static AssetTag TagOf(object measurement) => measurement switch
    {
        TripMeasurement t => t.Tag,
        ContactMeasurement c => c.Tag,
        InsulationMeasurement i => i.Tag,
        _ => throw new ArgumentOutOfRangeException(nameof(measurement), measurement.GetType().Name, "not a measurement"),
    };
}
