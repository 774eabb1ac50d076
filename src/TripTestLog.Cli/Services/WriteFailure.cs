using System.Text.RegularExpressions;

namespace TripTestLog.Cli.Services;

/// <summary>
/// A file or database the command could not write, said in one sentence that names the file and what to do: a full
/// disk (or a file the system will not let grow), a folder this user may not write, or another refusal of the system.
/// </summary>
internal static partial class WriteFailure
{
    // The operating system's codes as .NET carries them in an IOException's HResult: on Linux the errno (ENOSPC,
    // EFBIG), on Windows the Win32 error wrapped in an HRESULT (ERROR_DISK_FULL, ERROR_HANDLE_DISK_FULL).
    private static readonly int[] FullCodes = [28, 27, unchecked((int)0x80070070), unchecked((int)0x80070027)];

    /// <summary>
    /// True when <paramref name="e"/> or an exception inside it says the disk is full: SQLite's SQLITE_FULL (13), the
    /// server's disk_full (SQLSTATE 53100), or the operating system's no-space or file-too-large.
    /// </summary>
    public static bool IsFullDisk(Exception e)
    {
        for (Exception? x = e; x is not null; x = x.InnerException)
        {
            if (x is Microsoft.Data.Sqlite.SqliteException { SqliteErrorCode: 13 } or Npgsql.PostgresException { SqlState: "53100" }
                || (x is IOException && FullCodes.Contains(x.HResult)))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>
    /// A file-system failure in one sentence naming the file, or null when <paramref name="e"/> is none or names no file.
    /// A report file's temporary name is given as the file it was to become.
    /// </summary>
    public static string? Sentence(Exception e)
    {
        if (FileNamed(e) is not { } path)
        {
            return null;
        }

        if (IsFullDisk(e))
        {
            return $"the disk holding {path} is full (or will not let the file grow); it was not written, and files written "
                + "completely before it are left as they were: free space there, or give another folder, and run the command again";
        }

        return Has<UnauthorizedAccessException>(e)
            ? $"cannot write {path}: this user may not write there; make the folder (or the file) writable for this user, or give another folder"
            : $"cannot write {path}: {Innermost(e).Message.ReplaceLineEndings(" ").Trim().TrimEnd('.')}; check the folder exists, is writable and has space";
    }

    // .NET names the file in the message of the outer exception ('...'); the inner one holds only the system's words.
    private static string? FileNamed(Exception e)
    {
        for (Exception? x = e; x is not null; x = x.InnerException)
        {
            if (x is IOException or UnauthorizedAccessException && QuotedPath().Match(x.Message) is { Success: true } match)
            {
                var path = match.Groups[1].Value;
                return path.EndsWith(".partial", StringComparison.Ordinal) ? path[..^".partial".Length] : path;
            }
        }

        return null;
    }

    private static bool Has<T>(Exception e)
        where T : Exception
    {
        for (Exception? x = e; x is not null; x = x.InnerException)
        {
            if (x is T)
            {
                return true;
            }
        }

        return false;
    }

    private static Exception Innermost(Exception e)
    {
        while (e.InnerException is { } inner)
        {
            e = inner;
        }

        return e;
    }

    [GeneratedRegex(@"'((?:/|[A-Za-z]:\\)[^']*)'")]
    private static partial Regex QuotedPath();
}
