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

    /// <summary>
    /// A database's failure in one sentence, or null when <paramref name="e"/> is not one: a server that cannot be used
    /// says so as its store put it; a database error mid-command names the database's own words.
    /// </summary>
    public static string? Plain(Exception e)
    {
        if (e is StoreUnavailableException)
        {
            return e.Message;
        }

        while (e.InnerException is { } inner)
        {
            e = inner;
        }

        return e switch
        {
            Npgsql.PostgresException p => $"the database could not be used ({p.MessageText})",
            Npgsql.NpgsqlException or Microsoft.Data.Sqlite.SqliteException => $"the database could not be used ({e.Message.ReplaceLineEndings(" ").Trim()})",
            _ => null,
        };
    }
}
