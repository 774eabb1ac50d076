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

    /// <summary>A command as SQLite's own type, for statements the batch prepares and binds by position.</summary>
    internal SqliteCommand NativeCommand(string sql, SqliteTransaction transaction)
    {
        var command = _connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        return command;
    }
}
