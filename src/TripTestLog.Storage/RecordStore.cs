using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace TripTestLog.Storage;

/// <summary>
/// The SQLite store of devices and measurements. Opening applies any pending migrations (never EnsureCreated), so a
/// database made by an older version is upgraded in place.
/// </summary>
public sealed partial class RecordStore : IRecordStore
{
    private readonly SqliteConnection _connection;
    private readonly TripTestLogContext _context;

    private RecordStore(string path, SqliteConnection connection, TripTestLogContext context)
    {
        Path = path;
        _connection = connection;
        _context = context;
    }

    /// <summary>The database file.</summary>
    public string Path { get; }

    /// <inheritdoc />
    public string Location => Path;

    /// <summary>Opens, creating if need be, the database at <paramref name="path"/> and brings its schema up to date.</summary>
    public static RecordStore Open(string path)
    {
        var connection = StoreOptions.Connect(path);
        connection.Open();
        Execute(connection, "PRAGMA journal_mode=WAL;");
        Execute(connection, "PRAGMA synchronous=NORMAL;");
        Execute(connection, "PRAGMA foreign_keys=ON;");
        Execute(connection, "PRAGMA busy_timeout=10000;");

        // A 256 MiB page cache keeps the indexes of a million-row import in memory (SQLite's default, about 8 MiB, spills
        // them to disk on every random insert); it is a ceiling, filled only as pages are touched.
        Execute(connection, "PRAGMA cache_size=-262144;");
        Execute(connection, "PRAGMA temp_store=MEMORY;");
        var context = new TripTestLogContext(StoreOptions.For(connection));
        context.Database.Migrate();
        FingerprintScheme.Upgrade(connection);
        return new RecordStore(path, connection, context);
    }

    /// <summary>Turns SQLite's row-by-row foreign-key enforcement on or off for this connection (outside a transaction).</summary>
    internal void ForeignKeys(bool on) => Execute(_connection, on ? "PRAGMA foreign_keys=ON;" : "PRAGMA foreign_keys=OFF;");

    /// <summary>The migrations applied to this database, oldest first.</summary>
    public IReadOnlyList<string> AppliedMigrations() => _context.Database.GetAppliedMigrations().ToList();

    /// <inheritdoc />
    public void Dispose()
    {
        _context.Dispose();
        _connection.Dispose();
    }

    private static void Execute(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
