using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace TripTestLog.Storage;

/// <summary>The one place the SQLite provider and the migrations assembly are wired, shared with design-time tooling.</summary>
internal static class StoreOptions
{
    /// <summary>The assembly that holds the migrations (the project under migrations/).</summary>
    public const string MigrationsAssembly = "TripTestLog.Migrations";

    public static DbContextOptions<TripTestLogContext> For(SqliteConnection connection) =>
        new DbContextOptionsBuilder<TripTestLogContext>()
            .UseSqlite(connection, o => o.MigrationsAssembly(MigrationsAssembly))
            .Options;

    public static SqliteConnection Connect(string path)
    {
        var builder = new SqliteConnectionStringBuilder { DataSource = path, Pooling = false, DefaultTimeout = 30 };
        return new SqliteConnection(builder.ToString());
    }
}
