using System.Data.Common;
using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Sqlite;

/// <summary>Queries on the store's one connection inside one read transaction (<see cref="ReadTransaction"/>).</summary>
internal sealed class SqliteReadScope(SqliteConnection connection) : IReadScope
{
    private readonly ReadTransaction _transaction = ReadTransaction.Begin(connection);

    public DbCommand Query(string sql, AssetTag? only = null)
    {
        var command = connection.CreateCommand();
        command.CommandText = sql;
        if (sql.Contains("$tag", StringComparison.Ordinal))
        {
            command.Parameters.AddWithValue("$tag", (object?)only?.Value ?? DBNull.Value);
        }

        return command;
    }

    public void Dispose() => _transaction.Dispose();
}
