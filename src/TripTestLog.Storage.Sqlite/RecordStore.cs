using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using Microsoft.Data.Sqlite;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// The SQLite store of devices and measurements. Only an import creates a database, and only where no file exists; a
/// reader opens the file read-only and writes nothing; an import or `migrate` brings an older schema up to date.
/// </summary>
public sealed partial class RecordStore : RelationalStore, IRecordStore
{
    // 256 MiB, a ceiling: filled only as pages are touched.
    private const string LargeCache = "PRAGMA cache_size=-262144;";

    private readonly SqliteConnection _connection;
    private bool _largeCache;

    private RecordStore(string path, SqliteConnection connection, StoreOpening opening)
        : base(connection, SqliteDialect.Instance)
    {
        Path = path;
        _connection = connection;
        Opening = opening;
    }

    /// <summary>The database file.</summary>
    public string Path { get; }

    /// <inheritdoc />
    public string Location => Path;

    /// <summary>What the store was opened for, and how long its writes wait for another process's.</summary>
    internal StoreOpening Opening { get; }

    /// <summary>Opens the database at <paramref name="path"/> to import: creates it where no file exists, and brings its schema up to date.</summary>
    /// <exception cref="StoreRefusedException">When the file is not a TripTestLog database, or a newer version wrote it.</exception>
    public static RecordStore Open(string path) => Open(path, StoreOpening.ForImport);

    /// <summary>Opens the database at <paramref name="path"/> for what <paramref name="opening"/> says.</summary>
    /// <exception cref="StoreRefusedException">
    /// When the file is missing (and the purpose is not import), is not a TripTestLog database, was written by a newer
    /// version, or is behind and the purpose is reading: one sentence, and nothing written.
    /// </exception>
    public static RecordStore Open(string path, StoreOpening opening)
    {
        ArgumentNullException.ThrowIfNull(opening);
        var exists = File.Exists(path);
        if (!exists && opening.Purpose != StorePurpose.Import)
        {
            throw new StoreRefusedException($"no database at {path}; import records first (triptestlog import PATH --db {path})");
        }

        // A file being created is empty for a moment: an import that finds none, or an empty one, waits for whoever may
        // be creating it, then looks again, so an empty file is refused only when nobody is creating it.
        using var guard = opening.Purpose == StorePurpose.Import && (!exists || new FileInfo(path).Length == 0) ? MigrationGuard.Take(path, opening) : null;
        exists = File.Exists(path);
        if (exists)
        {
            SqliteSchema.RefuseForeignFile(path);
        }

        var reading = opening.Purpose == StorePurpose.Read;
        var connection = StoreOptions.Connect(path, reading ? SqliteOpenMode.ReadOnly : exists ? SqliteOpenMode.ReadWrite : SqliteOpenMode.ReadWriteCreate);
        try
        {
            connection.Open();
            if (reading)
            {
                SqliteSideFiles.RefuseIfReaderWouldCreate(path);
            }
            else
            {
                Execute(connection, "PRAGMA journal_mode=WAL;");
                Execute(connection, "PRAGMA synchronous=NORMAL;");
                SqliteSideFiles.Keep(connection);
            }

            Execute(connection, "PRAGMA foreign_keys=ON;");
            Execute(connection, $"PRAGMA busy_timeout={(reading ? 10_000 : StoreOptions.WriterWaitSeconds * 1000)};");

            // A writer's large page cache keeps the indexes of a million-row import in memory (SQLite's default spills them to
            // disk on every random insert). A reader starts with SQLite's default: with any larger cache a fresh connection's
            // first query ran twice as long on the project's machine (a peer group's, 95 ms against 45; the pages a larger
            // cache keeps are each new memory, where the default's few are reused). A reader takes the large cache when it
            // reads many devices (see ReadingMany).
            if (!reading)
            {
                Execute(connection, LargeCache);
            }

            Execute(connection, "PRAGMA temp_store=MEMORY;");
            SqliteSchema.BringUpToDate(path, connection, opening, isNew: !exists, guard);
            return new RecordStore(path, connection, opening);
        }
        catch
        {
            connection.Dispose();
            throw;
        }
    }

    /// <inheritdoc />
    protected override System.Data.Common.DbTransaction BeginWrite() => BeginWriting();

    /// <inheritdoc />
    protected override IReadScope BeginRead() => new SqliteReadScope(_connection);

    /// <inheritdoc />
    protected override void ReadingMany()
    {
        // A device's trips lie on pages shared with other devices' across the table, so a read in device order comes back
        // to each page many times: a cache that holds the table keeps those returns off the file.
        if (!_largeCache)
        {
            Execute(_connection, LargeCache);
            _largeCache = true;
        }
    }

    /// <summary>Turns SQLite's row-by-row foreign-key enforcement on or off for this connection (outside a transaction).</summary>
    internal void ForeignKeys(bool on) => Execute(_connection, on ? "PRAGMA foreign_keys=ON;" : "PRAGMA foreign_keys=OFF;");

    /// <summary>The migrations applied to this database, oldest first.</summary>
    public IReadOnlyList<string> AppliedMigrations() => SqliteSchema.Applied(_connection);

    /// <inheritdoc />
    public void Dispose()
    {
        _connection.Dispose();
    }

    internal static void Execute(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
