using System.Globalization;
using System.Text;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Migrations;
using TripTestLog.Application.Stores;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// What opening a SQLite file may do to its schema. A file that is not a TripTestLog database is refused, never taken
/// over; a schema newer than this version knows is refused before anything is written; a schema that is behind is
/// brought up to date only by an import or `migrate`, and a reader is told to run `migrate`. The schema's state is read
/// with plain SELECTs; migrating is the only step that takes EF Core's migration lock.
/// </summary>
internal static class SqliteSchema
{
    private const string History = "__EFMigrationsHistory";
    private const string LockTable = "__EFMigrationsLock";

    private static readonly byte[] Header = Encoding.ASCII.GetBytes("SQLite format 3\0");

    /// <summary>Refuses, in one sentence, a file that is empty or is no SQLite database at all.</summary>
    public static void RefuseForeignFile(string path)
    {
        var length = new FileInfo(path).Length;
        if (length == 0)
        {
            throw new StoreRefusedException($"{path} is empty (0 bytes), not a TripTestLog database; restore it from a backup, or move it aside and import again");
        }

        var start = new byte[Header.Length];
        using (var file = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete))
        {
            if (length < 100 || file.ReadAtLeast(start, start.Length, throwOnEndOfStream: false) < start.Length || !start.AsSpan().SequenceEqual(Header))
            {
                throw new StoreRefusedException($"{path} is not a TripTestLog database (it is not a SQLite file); name the database file, or move this file aside");
            }
        }
    }

    /// <summary>
    /// Checks the schema against this version's migrations and, where the purpose allows, applies the missing ones.
    /// </summary>
    public static void BringUpToDate(string path, SqliteConnection connection, StoreOpening opening, bool isNew, MigrationGuard? held)
    {
        var known = Known;
        var state = Read(connection);

        // A file with no schema yet may be one another import is creating this moment: a writer waits for its guard
        // and looks again before judging the file, so two imports into a new database both succeed.
        using var waited = !isNew && !state.HasHistory && held is null && opening.Purpose != StorePurpose.Read ? MigrationGuard.Take(path, opening) : null;
        if (waited is not null)
        {
            state = Read(connection);
            held = waited;
        }

        if (!isNew && !state.HasHistory && !state.HasLock)
        {
            throw new StoreRefusedException(state.TableCount == 0
                ? $"{path} holds no tables, so it is not a TripTestLog database; if an import was stopped while creating it, delete it and import again"
                : $"{path} is a SQLite database but not a TripTestLog one (it has none of its tables); name the database file");
        }

        var unknown = state.Applied.Where(m => !known.Contains(m)).ToList();
        if (unknown.Count > 0 || state.UserVersion > FingerprintScheme.Current)
        {
            var theirs = unknown.Count > 0 ? unknown.Max(StringComparer.Ordinal)! : $"fingerprint scheme {state.UserVersion}";
            var ours = unknown.Count > 0 ? known[^1] : $"fingerprint scheme {FingerprintScheme.Current}";
            throw new StoreRefusedException($"{path} was written by a newer version of TripTestLog (its schema is {theirs}; this version, "
                + $"{ProgramVersion}, knows up to {ours}); use that version or a newer one");
        }

        var behind = known.Count > state.Applied.Count || state.UserVersion < FingerprintScheme.Current;
        if (!behind)
        {
            return;
        }

        if (opening.Purpose == StorePurpose.Read)
        {
            throw new StoreRefusedException($"{path} has an older schema ({(state.Applied.Count == 0 ? "none" : state.Applied[^1])}; this version needs "
                + $"{known[^1]}); run `triptestlog migrate --db {path}` (or an import) first");
        }

        using var guard = held is null ? MigrationGuard.Take(path, opening) : null;
        ClearStaleLock(connection, opening, path);
        using (var context = new TripTestLogContext(StoreOptions.For(connection)))
        {
            Patiently(opening, path, () => context.Database.Migrate());
        }

        Patiently(opening, path, () => FingerprintScheme.Upgrade(connection));
    }

    /// <summary>The version of this build, as messages name it.</summary>
    public static string ProgramVersion =>
        typeof(SqliteSchema).Assembly.GetName().Version is { } v ? $"{v.Major}.{v.Minor}.{v.Build}" : "unknown";

    /// <summary>The migrations this version knows, oldest first.</summary>
    public static IReadOnlyList<string> Known => KnownIds.Value;

    /// <summary>The migrations applied to the database on <paramref name="connection"/>, oldest first.</summary>
    public static IReadOnlyList<string> Applied(SqliteConnection connection) => Read(connection).Applied;

    private static readonly Lazy<IReadOnlyList<string>> KnownIds = new(() => MigrationIds.In(StoreOptions.MigrationsAssembly));

    private static SchemaState Read(SqliteConnection connection)
    {
        var tables = new HashSet<string>(StringComparer.Ordinal);
        using (var names = connection.CreateCommand())
        {
            names.CommandText = "SELECT name FROM sqlite_master WHERE type = 'table'";
            using var reader = names.ExecuteReader();
            while (reader.Read())
            {
                tables.Add(reader.GetString(0));
            }
        }

        var applied = new List<string>();
        if (tables.Contains(History))
        {
            using var select = connection.CreateCommand();
            select.CommandText = $"SELECT MigrationId FROM \"{History}\" ORDER BY MigrationId";
            using var reader = select.ExecuteReader();
            while (reader.Read())
            {
                applied.Add(reader.GetString(0));
            }
        }

        using var version = connection.CreateCommand();
        version.CommandText = "PRAGMA user_version;";
        var userVersion = Convert.ToInt32(version.ExecuteScalar(), CultureInfo.InvariantCulture);
        return new SchemaState(tables.Count, tables.Contains(History), tables.Contains(LockTable), applied, userVersion);
    }

    // Called holding the guard, so no other TripTestLog process is migrating this file: a row in EF Core's lock table was
    // left by a process stopped during its start-up, and EF Core would wait for it for ever.
    private static void ClearStaleLock(SqliteConnection connection, StoreOpening opening, string path)
    {
        using var exists = connection.CreateCommand();
        exists.CommandText = $"SELECT COUNT(*) FROM sqlite_master WHERE type = 'table' AND name = '{LockTable}'";
        if ((long)exists.ExecuteScalar()! == 0)
        {
            return;
        }

        using var select = connection.CreateCommand();
        select.CommandText = $"SELECT Timestamp FROM \"{LockTable}\"";
        if (select.ExecuteScalar() is not { } taken || taken is DBNull)
        {
            return;
        }

        Patiently(opening, path, () => RecordStore.Execute(connection, $"DELETE FROM \"{LockTable}\""));
        opening.Note($"cleared the schema-upgrade lock taken at {taken} on {path} by a process that stopped during its start-up");
    }

    /// <summary>Runs <paramref name="write"/>, waiting (and saying so once) while another process holds the write lock.</summary>
    internal static void Patiently(StoreOpening opening, string path, Action write)
    {
        var started = DateTime.UtcNow;
        var said = false;
        while (true)
        {
            try
            {
                write();
                return;
            }
            catch (SqliteException e) when (e.SqliteErrorCode is 5 or 6)
            {
                if (DateTime.UtcNow - started >= opening.Patience)
                {
                    throw Gave(opening, path, e);
                }

                if (!said)
                {
                    opening.Note(Waiting(opening, path));
                    said = true;
                }

                Thread.Sleep(200);
            }
        }
    }

    /// <summary>What a wait for another writer says on stderr.</summary>
    public static string Waiting(StoreOpening opening, string path) =>
        $"waiting for another process writing to {path} to finish (up to {opening.PatienceText}, lab policy store_wait_minutes)";

    /// <summary>The one sentence when the wait runs out.</summary>
    public static StoreRefusedException Gave(StoreOpening opening, string path, Exception? inner = null) => new(
        $"another process kept {path} locked for writing longer than {opening.PatienceText}; nothing was written: try again when it has "
        + "finished, or raise store_wait_minutes in the lab policy", inner ?? new TimeoutException());

    private sealed record SchemaState(int TableCount, bool HasHistory, bool HasLock, List<string> Applied, int UserVersion);
}
