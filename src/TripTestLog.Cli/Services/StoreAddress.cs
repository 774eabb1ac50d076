using TripTestLog.Storage.Postgres;

namespace TripTestLog.Cli.Services;

/// <summary>
/// What `--db` names: a SQLite database file (the default, triptestlog.db), or a PostgreSQL server by URL or
/// connection string. Without `--db`, the environment variable TRIPTESTLOG_DB names it. The log and the lab policy
/// live in <see cref="Folder"/>: beside a database file, or the current folder for a server.
/// </summary>
internal sealed partial class StoreAddress
{
    /// <summary>The environment variable that names the database when `--db` is not given.</summary>
    public const string Variable = "TRIPTESTLOG_DB";

    private readonly string _given;

    private StoreAddress(FileInfo? file, ServerAddress? server, string given)
    {
        File = file;
        Server = server;
        _given = given;
    }

    /// <summary>The database file, when the store is SQLite.</summary>
    public FileInfo? File { get; }

    /// <summary>The server, when the store is PostgreSQL.</summary>
    public ServerAddress? Server { get; }

    /// <summary>How messages and logs name the store: the file's full path, or the server without any password.</summary>
    public string Display => File?.FullName ?? Server!.Display;

    /// <summary>Where the log and the lab policy are: the database file's folder, or the current folder for a server.</summary>
    public string Folder => File?.DirectoryName ?? Directory.GetCurrentDirectory();

    /// <summary>True for a file that exists, and always for a server (opening it creates the schema).</summary>
    public bool Exists => File?.Exists ?? true;

    /// <summary>A database file.</summary>
    public static StoreAddress OfFile(string path) => new(new FileInfo(path), null, path);

    /// <summary>
    /// Reads what `--db` (or the environment) says; a server address from a command line may not hold a password. An
    /// address with a scheme other than postgres:// or postgresql:// (a misspelling) is refused, not taken for a path.
    /// </summary>
    /// <exception cref="FormatException">When the address cannot be read; the message says what to fix and never repeats the address.</exception>
    public static StoreAddress Parse(string text, bool fromCommandLine)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (ServerAddress.Names(text))
        {
            return new(null, ServerAddress.Parse(text, fromCommandLine), "");
        }

        if (Scheme().Match(text.TrimStart()) is { Success: true } scheme)
        {
            // Only the scheme is repeated: the rest of a misspelt server address may hold a password.
            throw new FormatException($"'{scheme.Groups[1].Value}://' is not a kind of database this tool knows; "
                + "give a database file's path, or a server as postgres://user@host/dbname");
        }

        return OfFile(text);
    }

    /// <summary>
    /// For a command that may create the database (import): null when the database file's folder exists (or the store is
    /// a server), else the sentence refusing it, since `--db` never creates folders.
    /// </summary>
    public string? MissingFolder() =>
        File?.Directory is not { Exists: false } folder ? null
        : _given.Contains('@', StringComparison.Ordinal)
            ? "--db: the folder of the database file it names does not exist (not repeated here: it may hold a password); --db never creates folders"
            : $"--db: the folder {folder.FullName} does not exist; create it first (--db never creates folders)";

    // A URL's scheme of two or more letters (one letter is a Windows drive).
    [System.Text.RegularExpressions.GeneratedRegex("^([A-Za-z][A-Za-z0-9+.-]+)://")]
    private static partial System.Text.RegularExpressions.Regex Scheme();

    /// <summary>A file as it was given (help shows the default so); a server as <see cref="Display"/>, never with a password.</summary>
    public override string ToString() => File is null ? Display : _given;

    /// <summary>The store named by TRIPTESTLOG_DB, else triptestlog.db in the current folder.</summary>
    public static StoreAddress Default() =>
        Environment.GetEnvironmentVariable(Variable) is { Length: > 0 } named ? Parse(named, fromCommandLine: false) : OfFile("triptestlog.db");
}
