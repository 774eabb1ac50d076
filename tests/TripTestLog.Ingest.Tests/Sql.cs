using Microsoft.Data.Sqlite;

namespace TripTestLog.Ingest.Tests;

/// <summary>Reads a database file directly, on a connection of its own, to check what an import left behind.</summary>
internal static class Sql
{
    public static long Count(string db, string sql)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return (long)command.ExecuteScalar()!;
    }

    public static void Execute(string db, string sql)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
