using Microsoft.EntityFrameworkCore.Design;
using TripTestLog.Storage;
using TripTestLog.Storage.Postgres;

namespace TripTestLog.Migrations.Postgres;

/// <summary>Lets `dotnet ef` build the PostgreSQL model with the wiring the program uses; it never connects.</summary>
internal sealed class DesignTimeContextFactory : IDesignTimeDbContextFactory<TripTestLogContext>
{
    public TripTestLogContext CreateDbContext(string[] args) => new(ServerStoreOptions.For(new Npgsql.NpgsqlConnection("Host=localhost;Database=design")));
}
