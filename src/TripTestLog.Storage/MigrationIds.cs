using System.Reflection;
using Microsoft.EntityFrameworkCore.Migrations;

namespace TripTestLog.Storage;

/// <summary>
/// The migrations an assembly holds, read from their attributes. Opening a store only needs their names to compare with
/// the database's history; asking EF Core for them builds its whole service provider, which cost most of a second on
/// every command, so EF Core is started only when a schema is actually migrated.
/// </summary>
public static class MigrationIds
{
    /// <summary>The migration ids in the assembly named <paramref name="assemblyName"/>, oldest first (ids sort by their timestamp).</summary>
    public static IReadOnlyList<string> In(string assemblyName) =>
        [.. Assembly.Load(assemblyName).GetTypes()
            .Where(t => !t.IsAbstract && typeof(Migration).IsAssignableFrom(t))
            .Select(t => t.GetCustomAttribute<MigrationAttribute>()?.Id)
            .OfType<string>()
            .Order(StringComparer.Ordinal)];
}
