using System.Data.Common;
using Microsoft.Data.Sqlite;
using Npgsql;
using TripTestLog.Application.Stores;
using TripTestLog.Storage;
using TripTestLog.Storage.Postgres;

namespace TripTestLog.Ingest.Tests.Stores;

/// <summary>The two stores every storage test runs against.</summary>
public enum Provider
{
    /// <summary>The embedded SQLite file.</summary>
    Sqlite,

    /// <summary>A real PostgreSQL server (scripts/test-server.sh starts one; TRIPTESTLOG_TEST_PG names it).</summary>
    Postgres,
}

/// <summary>
/// A fresh, empty database of one provider: a SQLite file in a temp folder, or a schema of its own on the test server
/// (dropped afterwards). Tests read what a store left behind through <see cref="Scalar"/>, on a connection of their own.
/// </summary>
internal sealed class TestDatabase : IDisposable
{
    /// <summary>The variable that names the test server's database (scripts/test-server.sh writes it).</summary>
    public const string ServerVariable = "TRIPTESTLOG_TEST_PG";

    private TestDatabase(Provider provider, string address, string? schema)
    {
        Provider = provider;
        Address = address;
        Schema = schema;
    }

    /// <summary>The test server's connection string, when one is configured.</summary>
    public static string? Server => Environment.GetEnvironmentVariable(ServerVariable) is { Length: > 0 } s ? s : null;

    /// <summary>Every provider this run can test: SQLite always; PostgreSQL when a test server is configured.</summary>
    public static TheoryData<Provider> Providers => Server is null ? new TheoryData<Provider> { Provider.Sqlite } : new TheoryData<Provider> { Provider.Sqlite, Provider.Postgres };

    public Provider Provider { get; }

    /// <summary>What `--db` takes for this database: the file's path, or the server's connection string with the schema.</summary>
    public string Address { get; }

    public string? Schema { get; }

    public static TestDatabase Create(Provider provider, string folder)
    {
        if (provider == Provider.Sqlite)
        {
            return new TestDatabase(provider, Path.Combine(folder, "test.db"), null);
        }

        var server = Server ?? throw new InvalidOperationException($"{ServerVariable} is not set; start a test server with scripts/test-server.sh start");
        var schema = "t_" + Guid.NewGuid().ToString("N")[..16];
        using (var connection = new NpgsqlConnection(server))
        {
            connection.Open();
            using var create = new NpgsqlCommand($"CREATE SCHEMA {schema}", connection);
            create.ExecuteNonQuery();
        }

        return new TestDatabase(provider, new NpgsqlConnectionStringBuilder(server) { SearchPath = schema }.ConnectionString, schema);
    }

    public IRecordStore Open() => Provider == Provider.Sqlite
        ? RecordStore.Open(Address)
        : PostgresRecordStore.Open(ServerAddress.Parse(Address, fromCommandLine: false));

    /// <summary>The first value of <paramref name="sql"/>; a server's boolean reads as SQLite's 0 or 1, its numbers as SQLite's.</summary>
    public object? Scalar(string sql)
    {
        using var connection = Connect();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return command.ExecuteScalar() switch
        {
            bool b => b ? 1L : 0L,
            int i => (long)i,
            DBNull => null,
            var other => other,
        };
    }

    public long Count(string sql) => (long)Scalar(sql)!;

    public void Dispose()
    {
        if (Schema is null)
        {
            SqliteConnection.ClearAllPools();
            return;
        }

        NpgsqlConnection.ClearAllPools();
        using var connection = new NpgsqlConnection(Server);
        connection.Open();
        using var drop = new NpgsqlCommand($"DROP SCHEMA {Schema} CASCADE", connection);
        drop.ExecuteNonQuery();
    }

    private DbConnection Connect()
    {
        DbConnection connection = Provider == Provider.Sqlite ? new SqliteConnection($"Data Source={Address};Pooling=False") : new NpgsqlConnection(Address);
        connection.Open();
        return connection;
    }
}
