using System.Runtime.InteropServices;
using Microsoft.Data.Sqlite;
using TripTestLog.Application.Stores;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// The write-ahead files beside a database (PATH-wal, PATH-shm). A writer keeps them when it closes (emptied, owned by
/// whoever may write the database), so a reader finds them there: a reader that cannot write creates none, leaves none
/// behind, and never leaves files the owner cannot write. SQLite reads a WAL database read-only only when they exist.
/// </summary>
internal static class SqliteSideFiles
{
    // sqlite3.h: SQLITE_FCNTL_PERSIST_WAL.
    private const int PersistWal = 10;

    // The SQLite library the provider bundles; its .NET wrapper does not expose sqlite3_file_control.
    [DllImport("e_sqlite3", EntryPoint = "sqlite3_file_control", CallingConvention = CallingConvention.Cdecl)]
    private static extern int FileControl(IntPtr database, [MarshalAs(UnmanagedType.LPUTF8Str)] string name, int operation, ref int argument);

    /// <summary>Asks SQLite to keep both files when this connection closes, and to empty the -wal file then.</summary>
    public static void Keep(SqliteConnection connection)
    {
        var keep = 1;
        _ = FileControl(connection.Handle!.DangerousGetHandle(), "main", PersistWal, ref keep);

        // With a size limit set, SQLite empties the kept -wal file on close instead of leaving its last size.
        RecordStore.Execute(connection, "PRAGMA journal_size_limit=67108864;");
    }

    /// <summary>
    /// Refuses, in one sentence, a read by a user who cannot write the database when its write-ahead files are missing:
    /// SQLite would create them owned by this user, and the owner could then no longer write.
    /// </summary>
    public static void RefuseIfReaderWouldCreate(string path)
    {
        if ((File.Exists(path + "-wal") && File.Exists(path + "-shm")) || CanWrite(path))
        {
            return;
        }

        throw new StoreRefusedException($"{path} has no write-ahead files ({Path.GetFileName(path)}-wal, -shm) and this user may only read it; "
            + $"ask its owner to run `triptestlog migrate --db {path}` once, which makes them");
    }

    private static bool CanWrite(string path)
    {
        try
        {
            using var probe = new FileStream(path, FileMode.Open, FileAccess.ReadWrite, FileShare.ReadWrite | FileShare.Delete);
            return true;
        }
        catch (UnauthorizedAccessException)
        {
            return false;
        }
    }
}
