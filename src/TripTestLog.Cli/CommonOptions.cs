using System.CommandLine;

namespace TripTestLog.Cli;

/// <summary>Options shared by several commands.</summary>
internal static class CommonOptions
{
    /// <summary>The database file; created on first use. The log file is written beside it.</summary>
    public static Option<FileInfo> Database() => new("--db")
    {
        Description = "Database file (created if missing), the log beside it",
        DefaultValueFactory = _ => new FileInfo("triptestlog.db"),
        HelpName = "PATH",
    };

    /// <summary>
    /// True, after writing the one sentence every reading command gives, when <paramref name="db"/> does not exist (only
    /// import creates a database).
    /// </summary>
    public static bool Missing(CliContext cli, FileInfo db)
    {
        if (db.Exists)
        {
            return false;
        }

        cli.Error.WriteLine($"error: no database at {db.FullName}; import records first (triptestlog import PATH --db {db.FullName})");
        return true;
    }

    /// <summary>The database file of a command that reads an existing database and refuses a missing one.</summary>
    public static Option<FileInfo> ExistingDatabase() => new("--db")
    {
        Description = "Database file to read (it must exist; import creates it)",
        DefaultValueFactory = _ => new FileInfo("triptestlog.db"),
        HelpName = "PATH",
    };
}
