using TripTestLog.Application.Stores;
using TripTestLog.Storage;
using TripTestLog.Storage.Postgres;

namespace TripTestLog.Cli.Services;

/// <summary>
/// Opens the store a command names. The one place the executable chooses a database: the embedded SQLite file, or a
/// PostgreSQL server named by its address; both are an <see cref="IRecordStore"/> and nothing above here tells them apart.
/// </summary>
internal static class Stores
{
    /// <summary>Opens (creating and migrating a new database or schema) the store at <paramref name="address"/>.</summary>
    public static IRecordStore Open(StoreAddress address) =>
        address.Server is { } server ? PostgresRecordStore.Open(server) : RecordStore.Open(address.File!.FullName);
}
