using TripTestLog.Application.Stores;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// An exclusive lock on a file beside the database (PATH-migrating) that a process holds while it creates or upgrades
/// the schema. The operating system drops it when the process ends, however it ends, so whoever holds it knows that no
/// other TripTestLog process is migrating and that a row left in EF Core's lock table is stale. Readers never take it.
/// </summary>
internal sealed class MigrationGuard : IDisposable
{
    private readonly FileStream _file;
    private readonly string _path;

    private MigrationGuard(FileStream file, string path)
    {
        _file = file;
        _path = path;
    }

    /// <summary>Takes the guard of the database at <paramref name="database"/>, waiting as <paramref name="opening"/> allows and saying so.</summary>
    /// <exception cref="StoreRefusedException">When another process holds it longer than the wait allows.</exception>
    public static MigrationGuard Take(string database, StoreOpening opening)
    {
        var path = database + "-migrating";
        var started = DateTime.UtcNow;
        var said = false;
        while (true)
        {
            try
            {
                return new MigrationGuard(new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None), path);
            }
            catch (IOException) when (DateTime.UtcNow - started < opening.Patience)
            {
                if (!said)
                {
                    opening.Note($"waiting for another process creating or upgrading the schema of {database} (up to {opening.PatienceText}, lab policy store_wait_minutes)");
                    said = true;
                }

                Thread.Sleep(200);
            }
            catch (IOException e)
            {
                throw new StoreRefusedException($"another process kept the schema of {database} locked for longer than {opening.PatienceText}; nothing was "
                    + $"written: if no TripTestLog is running, delete {path} and try again", e);
            }
        }
    }

    public void Dispose()
    {
        // Removed while still held, so a process that opens the path next makes a fresh file and takes it at once.
        try
        {
            File.Delete(_path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
        }

        _file.Dispose();
    }
}
