using System.CommandLine;
using System.CommandLine.Parsing;
using TripTestLog.Cli.Services;

namespace TripTestLog.Cli;

/// <summary>Options shared by several commands.</summary>
internal static class CommonOptions
{
    /// <summary>The database: a SQLite file, created on first use, with the log beside it; or a PostgreSQL server.</summary>
    public static Option<StoreAddress> Database() => new("--db")
    {
        Description = $"Database file (created if missing), the log beside it; or a server, postgres://user@host/dbname ({StoreAddress.Variable} names it when --db is not given)",
        DefaultValueFactory = DefaultAddress,
        CustomParser = Address,
        HelpName = "PATH|URL",
    };

    /// <summary>
    /// True, after writing the one sentence every reading command gives, when <paramref name="db"/> does not exist (only
    /// import creates a database).
    /// </summary>
    public static bool Missing(CliContext cli, StoreAddress db)
    {
        if (db.Exists)
        {
            return false;
        }

        cli.Error.WriteLine($"error: no database at {db.Display}; import records first (triptestlog import PATH --db {db.Display})");
        return true;
    }

    /// <summary>The database file of a command that reads an existing database and refuses a missing one.</summary>
    public static Option<StoreAddress> ExistingDatabase() => new("--db")
    {
        Description = $"Database file to read (it must exist; import creates it), or a server, postgres://user@host/dbname ({StoreAddress.Variable} names it when --db is not given)",
        DefaultValueFactory = DefaultAddress,
        CustomParser = Address,
        HelpName = "PATH|URL",
    };

    /// <summary>A required database option other than --db (e.g. transfer's --from and --to).</summary>
    public static Option<StoreAddress> Store(string name, string description) => new(name)
    {
        Description = description,
        Required = true,
        CustomParser = Address,
        HelpName = "PATH|URL",
    };

    // TRIPTESTLOG_DB that cannot be read is a usage error too, named as the variable, not a failure of the parser.
    private static StoreAddress DefaultAddress(ArgumentResult result)
    {
        try
        {
            return StoreAddress.Default();
        }
        catch (FormatException e)
        {
            result.AddError($"{StoreAddress.Variable}: {e.Message}");
            return StoreAddress.OfFile("triptestlog.db");
        }
    }

    // A server address that cannot be read, or that holds a password, is a usage error with one sentence.
    private static StoreAddress? Address(ArgumentResult result)
    {
        var text = result.Tokens.Count > 0 ? result.Tokens[^1].Value : "";
        try
        {
            return StoreAddress.Parse(text, fromCommandLine: true);
        }
        catch (FormatException e)
        {
            result.AddError($"{(result.Parent as OptionResult)?.Option.Name ?? "--db"}: {e.Message}");
            return null;
        }
    }
}
