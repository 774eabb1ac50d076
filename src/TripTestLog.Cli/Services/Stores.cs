using TripTestLog.Application.Stores;
using TripTestLog.Storage.Sqlite;
using TripTestLog.Storage.Postgres;

namespace TripTestLog.Cli.Services;

/// <summary>
/// Opens the store a command names. The one place the executable chooses a database: the embedded SQLite file, or a
/// PostgreSQL server named by its address; both are an <see cref="IRecordStore"/> and nothing above here tells them apart.
/// </summary>
internal static class Stores
{
    /// <summary>
    /// Opens the store at <paramref name="address"/> for <paramref name="purpose"/>: a reader writes nothing; only an import
    /// creates a database (where no file exists) or brings its schema up to date, as `migrate` does. Waits for another
    /// process's write as long as the lab policy's store_wait_minutes allows, saying on stderr what it waits for.
    /// </summary>
    public static IRecordStore Open(CliContext cli, StoreAddress address, StorePurpose purpose)
    {
        var minutes = PolicyLoader.Load(null, address, out _) is { } policy ? policy.Policy.StoreWaitMinutes : StoreOpening.DefaultPatience.TotalMinutes;
        var opening = new StoreOpening(purpose, TimeSpan.FromMinutes(minutes), what => cli.Error.WriteLine(what));
        return address.Server is { } server ? PostgresRecordStore.Open(server, opening) : RecordStore.Open(address.File!.FullName, opening);
    }

    /// <summary>
    /// A database's failure in one sentence, or null when <paramref name="e"/> is not one: a server that cannot be used
    /// says so as its store put it; a database error mid-command names the database's own words.
    /// </summary>
    public static string? Plain(Exception e)
    {
        if (e is StoreUnavailableException or StoreRefusedException)
        {
            return e.Message;
        }

        if (ServerClosed(e))
        {
            return "the database server closed the connection during the command; nothing of the file in progress was stored (each file is one "
                + "transaction): import it again when the server is back";
        }

        while (e.InnerException is { } inner)
        {
            e = inner;
        }

        return e switch
        {
            Npgsql.PostgresException { SqlState: "42501" } p when p.MessageText.Contains("row-level security", StringComparison.Ordinal) =>
                "the file names a site this role may not write: its rows are confined to its own sites (site_access on the server); "
                + "nothing of the file was stored: ask the owner role to add the site, or import it as that site's lab",
            Npgsql.PostgresException p => $"the database could not be used ({p.MessageText})",
            Npgsql.NpgsqlException or Microsoft.Data.Sqlite.SqliteException => $"the database could not be used ({e.Message.ReplaceLineEndings(" ").Trim()})",
            _ => null,
        };
    }

    // The server went away mid-command: the socket broke or the stream ended, in whichever layer noticed first.
    private static bool ServerClosed(Exception e)
    {
        for (Exception? x = e; x is not null; x = x.InnerException)
        {
            if (x is Npgsql.PostgresException { SqlState: "57P01" or "57P02" or "57P03" }
                || (x is Npgsql.NpgsqlException && x.InnerException is IOException or EndOfStreamException or System.Net.Sockets.SocketException)
                || (x is Npgsql.NpgsqlException && x.Message.Contains("Broken pipe", StringComparison.Ordinal)))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>The migrations applied to <paramref name="store"/>, oldest first.</summary>
    public static IReadOnlyList<string> AppliedMigrations(IRecordStore store) => store switch
    {
        RecordStore file => file.AppliedMigrations(),
        PostgresRecordStore server => server.AppliedMigrations(),
        _ => [],
    };
}
