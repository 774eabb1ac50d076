using Microsoft.EntityFrameworkCore;
using Npgsql;
using TripTestLog.Application.Stores;

namespace TripTestLog.Storage.Postgres;

/// <summary>
/// What opening a server database may do to its schema: read its state with plain SELECTs; refuse a schema newer than
/// this version knows before anything is written; and only for an import or `migrate`, and only when it is behind, take
/// the migration lock (visibly, bounded by the lab policy) and migrate. A role that may not migrate is told so.
/// </summary>
internal static class ServerSchema
{
    public static void BringUpToDate(string display, NpgsqlConnection connection, StoreOpening opening, long migrationLock)
    {
        var known = Known;
        var applied = Applied(connection);
        if (applied is not null && applied.FirstOrDefault(m => !known.Contains(m)) is not null)
        {
            var theirs = applied.Where(m => !known.Contains(m)).Max(StringComparer.Ordinal);
            throw new StoreRefusedException($"{display} was written by a newer version of TripTestLog (its schema is {theirs}; this version, "
                + $"{ProgramVersion}, knows up to {known[^1]}); use that version or a newer one");
        }

        if (applied is not null && applied.Count == known.Count)
        {
            return;
        }

        if (opening.Purpose == StorePurpose.Read)
        {
            throw new StoreRefusedException(applied is null or { Count: 0 }
                ? $"{display} holds no TripTestLog schema yet; import records first, or have the owner role run `triptestlog migrate --db {display}`"
                : $"{display} has an older schema ({applied[^1]}; this version needs {known[^1]}); have the owner role run `triptestlog migrate --db {display}` first");
        }

        TakeLock(display, connection, opening, migrationLock);
        try
        {
            using var context = new TripTestLogContext(ServerStoreOptions.For(connection));
            context.Database.Migrate();
        }
        catch (PostgresException e) when (e.SqlState == PostgresErrorCodes.InsufficientPrivilege)
        {
            throw new StoreRefusedException($"the role {connection.UserName} may not create or change the schema of {display} ({e.MessageText}); "
                + $"the owner role runs `triptestlog migrate --db {display}`", e);
        }
        finally
        {
            PostgresRecordStore.Execute(connection, $"SELECT pg_advisory_unlock({migrationLock})");
        }
    }

    /// <summary>The version of this build, as messages name it.</summary>
    public static string ProgramVersion =>
        typeof(ServerSchema).Assembly.GetName().Version is { } v ? $"{v.Major}.{v.Minor}.{v.Build}" : "unknown";

    /// <summary>The migrations this version knows, oldest first, read without starting EF Core.</summary>
    public static IReadOnlyList<string> Known => KnownIds.Value;

    private static readonly Lazy<IReadOnlyList<string>> KnownIds = new(() => MigrationIds.In(ServerStoreOptions.MigrationsAssembly));

    // The applied migrations by a plain SELECT, or null when the history table is not there (nothing was ever migrated).
    internal static List<string>? Applied(NpgsqlConnection connection)
    {
        using (var exists = new NpgsqlCommand("SELECT to_regclass('\"__EFMigrationsHistory\"') IS NOT NULL", connection))
        {
            if (!(bool)exists.ExecuteScalar()!)
            {
                return null;
            }
        }

        using var select = new NpgsqlCommand("SELECT \"MigrationId\" FROM \"__EFMigrationsHistory\" ORDER BY \"MigrationId\"", connection);
        using var reader = select.ExecuteReader();
        var applied = new List<string>();
        while (reader.Read())
        {
            applied.Add(reader.GetString(0));
        }

        return applied;
    }

    // A session lock: the server drops it when the session ends, however it ends, so a killed start-up leaves none.
    private static void TakeLock(string display, NpgsqlConnection connection, StoreOpening opening, long key)
    {
        using var take = new NpgsqlCommand($"SELECT pg_try_advisory_lock({key})", connection);
        var started = DateTime.UtcNow;
        var said = false;
        while (!(bool)take.ExecuteScalar()!)
        {
            if (DateTime.UtcNow - started >= opening.Patience)
            {
                throw new StoreRefusedException($"another process kept the schema of {display} locked for longer than {opening.PatienceText}; "
                    + "nothing was written: try again when it has finished, or raise store_wait_minutes in the lab policy");
            }

            if (!said)
            {
                opening.Note($"waiting for another process creating or upgrading the schema of {display} (up to {opening.PatienceText}, lab policy store_wait_minutes)");
                said = true;
            }

            Thread.Sleep(200);
        }
    }
}
