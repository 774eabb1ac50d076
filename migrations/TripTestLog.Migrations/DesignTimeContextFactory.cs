using Microsoft.EntityFrameworkCore.Design;
using TripTestLog.Storage;
using TripTestLog.Storage.Sqlite;

namespace TripTestLog.Migrations;

/// <summary>Lets `dotnet ef` build the context with the same wiring the program uses.</summary>
internal sealed class DesignTimeContextFactory : IDesignTimeDbContextFactory<TripTestLogContext>
{
    public TripTestLogContext CreateDbContext(string[] args) =>
        new(StoreOptions.For(StoreOptions.Connect(Path.Combine(Path.GetTempPath(), "triptestlog-design.db"))));
}
