using Microsoft.Data.Sqlite;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// A plain read transaction (BEGIN ... COMMIT) on a connection with none open: every query run until it ends reads the
/// same snapshot of the file. When the connection is already inside a transaction, that one is the snapshot and this
/// does nothing.
/// </summary>
internal sealed class ReadTransaction : IDisposable
{
    private readonly SqliteConnection? _connection;

    private ReadTransaction(SqliteConnection? connection) => _connection = connection;

    public static ReadTransaction Begin(SqliteConnection connection)
    {
        if (SQLitePCL.raw.sqlite3_get_autocommit(connection.Handle) == 0)
        {
            return new ReadTransaction(null);
        }

        RecordStore.Execute(connection, "BEGIN");

        // A deferred transaction takes its snapshot at its first read: read now, before any query of the caller's.
        RecordStore.Execute(connection, "SELECT COUNT(*) FROM sqlite_master");
        return new ReadTransaction(connection);
    }

    public void Dispose()
    {
        if (_connection is not null && SQLitePCL.raw.sqlite3_get_autocommit(_connection.Handle) == 0)
        {
            RecordStore.Execute(_connection, "COMMIT");
        }
    }
}
