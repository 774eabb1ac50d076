using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;

namespace TripTestLog.Storage.Sqlite;

/// <summary>The one place the SQLite provider and the migrations assembly are wired, shared with design-time tooling.</summary>
internal static class StoreOptions
{
    /// <summary>The assembly that holds the migrations (the project under migrations/).</summary>
    public const string MigrationsAssembly = "TripTestLog.Migrations";

    /// <summary>Seconds one attempt of a writer waits for SQLite's write lock before its caller says it is waiting.</summary>
    public const int WriterWaitSeconds = 2;

    public static DbContextOptions<TripTestLogContext> For(SqliteConnection connection) =>
        new DbContextOptionsBuilder<TripTestLogContext>()
            .UseSqlite(connection, o => o.MigrationsAssembly(MigrationsAssembly))
            .ReplaceService<IModelCustomizer, SqliteModel>()
            .Options;

    /// <summary>
    /// A connection to the file at <paramref name="path"/>: read-only for a reader (it can write nothing, so a reader
    /// without write access breaks nothing), read-write for a writer, and creating the file only when asked.
    /// </summary>
    public static SqliteConnection Connect(string path, SqliteOpenMode mode = SqliteOpenMode.ReadWriteCreate)
    {
        // A writer's own wait for the write lock is short: its callers wait on, for as long as the lab policy allows, and
        // say on stderr what they wait for. A reader (never blocked by a writer in WAL mode) keeps SQLite's long wait.
        var builder = new SqliteConnectionStringBuilder
        {
            DataSource = path, Pooling = false, DefaultTimeout = mode == SqliteOpenMode.ReadOnly ? 30 : WriterWaitSeconds, Mode = mode,
        };
        return new SqliteConnection(builder.ToString());
    }
}
