using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Npgsql;

namespace TripTestLog.Storage.Postgres;

/// <summary>The one place the PostgreSQL provider and its migrations assembly are wired, shared with design-time tooling.</summary>
internal static class ServerStoreOptions
{
    /// <summary>The assembly that holds the PostgreSQL migrations (under migrations/).</summary>
    public const string MigrationsAssembly = "TripTestLog.Migrations.Postgres";

    public static DbContextOptions<TripTestLogContext> For(NpgsqlConnection connection) =>
        new DbContextOptionsBuilder<TripTestLogContext>()
            .UseNpgsql(connection, o => o.MigrationsAssembly(MigrationsAssembly))
            .ReplaceService<IModelCustomizer, ServerModel>()
            .Options;
}
