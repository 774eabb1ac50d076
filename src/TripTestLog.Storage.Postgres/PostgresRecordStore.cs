using Microsoft.EntityFrameworkCore;
using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Stores;


namespace TripTestLog.Storage.Postgres;

/// <summary>
/// The store on a PostgreSQL server, shared by many machines: the same model and contract as the SQLite file, with the
/// server's column types. Opening applies pending migrations, one process at a time. Imports run side by side; each
/// file's final write is one transaction under a server-wide lock, so two copies of one file end as one.
/// </summary>
public sealed partial class PostgresRecordStore : RelationalStore, IRecordStore
{
    // Advisory lock keys: one for schema changes, one for the final write of every import. Any two distinct numbers do;
    // these spell "TTLmigr" and "TTLimpt" so they are recognisable in pg_locks.
    private const long MigrationLock = 0x54544C6D696772;
    private const long ImportLock = 0x54544C696D7074;

    private readonly NpgsqlDataSource _source;
    private readonly NpgsqlConnection _connection;

    private PostgresRecordStore(ServerAddress address, NpgsqlDataSource source, NpgsqlConnection connection, StoreOpening opening)
        : base(connection, ServerDialect.Instance)
    {
        Location = address.Display;
        _source = source;
        _connection = connection;
        Opening = opening;
    }

    /// <inheritdoc />
    public string Location { get; }

    /// <summary>What the store was opened for, and how long it waits for the server-wide import lock.</summary>
    internal StoreOpening Opening { get; }

    /// <summary>Connects to the server to import, creating or bringing the schema up to date.</summary>
    /// <exception cref="StoreUnavailableException">When the server cannot be reached or refuses the login: the message says which.</exception>
    /// <exception cref="StoreRefusedException">When a newer version wrote the schema, or the role may not migrate it.</exception>
    public static PostgresRecordStore Open(ServerAddress address) => Open(address, StoreOpening.ForImport);

    /// <summary>
    /// Connects to the server for what <paramref name="opening"/> says. A reader runs only SELECTs (a role with SELECT
    /// alone can read); only an import or `migrate` changes the schema, and only when it is behind.
    /// </summary>
    /// <exception cref="StoreUnavailableException">When the server cannot be reached or refuses the login: the message says which.</exception>
    /// <exception cref="StoreRefusedException">
    /// When a newer version wrote the schema, the schema is behind and the purpose is reading, or the role may not
    /// migrate it: one sentence, and nothing written.
    /// </exception>
    public static PostgresRecordStore Open(ServerAddress address, StoreOpening opening)
    {
        ArgumentNullException.ThrowIfNull(address);
        ArgumentNullException.ThrowIfNull(opening);

        // A long statement (a 5 M-row file's final move, a large sort) runs as long as it needs: Npgsql's default of 30 s
        // would end it. A wait on a lock is bounded by the lab policy instead, where the code waits.
        var builder = new NpgsqlConnectionStringBuilder(address.Builder.ConnectionString);
        if (builder.CommandTimeout == 30)
        {
            builder.CommandTimeout = 0;
        }

        var source = NpgsqlDataSource.Create(builder);
        NpgsqlConnection? connection = null;
        try
        {
            connection = source.OpenConnection();
            ServerSchema.BringUpToDate(address.Display, connection, opening, MigrationLock);
            return new PostgresRecordStore(address, source, connection, opening);
        }
        catch (Exception e) when (e is NpgsqlException or TimeoutException)
        {
            connection?.Dispose();
            source.Dispose();
            throw new StoreUnavailableException($"the database server {address.Display} could not be used ({Plain(e)})", e);
        }
        catch
        {
            connection?.Dispose();
            source.Dispose();
            throw;
        }
    }

    /// <summary>The migrations applied to this database, oldest first.</summary>
    public IReadOnlyList<string> AppliedMigrations() => ServerSchema.Applied(_connection) ?? [];

    /// <inheritdoc />
    public void Dispose()
    {
        _connection.Dispose();
        _source.Dispose();
    }

    /// <inheritdoc />
    protected override System.Data.Common.DbTransaction BeginWrite()
    {
        var transaction = _connection.BeginTransaction();
        try
        {
            TakeImportLock(transaction);
            return transaction;
        }
        catch
        {
            transaction.Dispose();
            throw;
        }
    }

    /// <inheritdoc />
    protected override IReadScope BeginRead() => new ReadSnapshot(this);

    internal NpgsqlCommand ServerCommand(string sql, NpgsqlTransaction? transaction = null) => new(sql, _connection, transaction);

    /// <summary>A new connection of the same server, for a reader that runs beside another.</summary>
    internal NpgsqlConnection Connect() => _source.OpenConnection();

    internal static void Execute(NpgsqlConnection connection, string sql)
    {
        using var command = new NpgsqlCommand(sql, connection);
        command.ExecuteNonQuery();
    }

    internal static string Plain(Exception e) => e switch
    {
        PostgresException p => p.MessageText,
        _ => (e.InnerException ?? e).Message.ReplaceLineEndings(" ").Trim().TrimEnd('.'),
    };
}
