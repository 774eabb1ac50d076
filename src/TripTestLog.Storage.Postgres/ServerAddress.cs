using Npgsql;

namespace TripTestLog.Storage.Postgres;

/// <summary>
/// Where a PostgreSQL store is: a URL (<c>postgres://user@host:port/dbname</c>) or a key=value connection string
/// (<c>Host=...;Database=...</c>). The password never travels in it from a command line: it comes from PGPASSWORD or a
/// .pgpass file (PGPASSFILE), which Npgsql reads itself, and it is never part of <see cref="Display"/>.
/// </summary>
public sealed partial class ServerAddress
{
    private ServerAddress(NpgsqlConnectionStringBuilder builder)
    {
        Builder = builder;
        Display = $"postgres://{(builder.Username is { Length: > 0 } u ? u + "@" : "")}{builder.Host}:{builder.Port}/{builder.Database}"
            + (builder.SearchPath is { Length: > 0 } s ? $" (schema {s})" : "");
    }

    /// <summary>The connection settings.</summary>
    internal NpgsqlConnectionStringBuilder Builder { get; }

    /// <summary>How the store is named in messages and logs: user, host, port and database, never a password.</summary>
    public string Display { get; }

    /// <summary>True when <paramref name="text"/> names a server rather than a database file.</summary>
    public static bool Names(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var t = text.TrimStart();
        return t.StartsWith("postgres://", StringComparison.OrdinalIgnoreCase)
            || t.StartsWith("postgresql://", StringComparison.OrdinalIgnoreCase)
            || (HostKeyword().IsMatch(t) && !File.Exists(t));
    }

    /// <summary>
    /// Reads a server address. <paramref name="fromCommandLine"/> refuses a password in it, because a command line lands in
    /// logs and shell history; an address from the environment may carry one.
    /// </summary>
    /// <exception cref="FormatException">When the address cannot be read, or holds a password on a command line; the message says what to fix.</exception>
    public static ServerAddress Parse(string text, bool fromCommandLine)
    {
        ArgumentNullException.ThrowIfNull(text);
        var builder = text.TrimStart().StartsWith("postgres", StringComparison.OrdinalIgnoreCase) && text.Contains("://", StringComparison.Ordinal)
            ? FromUrl(text.Trim())
            : FromKeywords(text);
        if (fromCommandLine && !string.IsNullOrEmpty(builder.Password))
        {
            throw new FormatException("the database address holds a password; give it in PGPASSWORD or a .pgpass file instead, never on the command line");
        }

        if (string.IsNullOrEmpty(builder.Host) || string.IsNullOrEmpty(builder.Database))
        {
            throw new FormatException("a server address needs a host and a database, e.g. postgres://user@host/dbname or Host=host;Database=dbname");
        }

        builder.ApplicationName ??= "triptestlog";
        return new ServerAddress(builder);
    }

    // A connection string names its host as Host=... (or Server=...), first or after a semicolon.
    [System.Text.RegularExpressions.GeneratedRegex(@"(^|;)\s*(host|server)\s*=", System.Text.RegularExpressions.RegexOptions.IgnoreCase)]
    private static partial System.Text.RegularExpressions.Regex HostKeyword();

    private static NpgsqlConnectionStringBuilder FromKeywords(string text)
    {
        try
        {
            return new NpgsqlConnectionStringBuilder(text);
        }
        catch (ArgumentException e)
        {
            throw new FormatException($"the server address could not be read ({e.Message.Split('\n')[0].TrimEnd('.')})", e);
        }
    }

    private static NpgsqlConnectionStringBuilder FromUrl(string text)
    {
        if (!Uri.TryCreate(text, UriKind.Absolute, out var uri) || uri.Host.Length == 0)
        {
            throw new FormatException($"'{Redacted(text)}' is not a server address; write it as postgres://user@host:port/dbname");
        }

        var builder = new NpgsqlConnectionStringBuilder { Host = uri.Host, Database = Uri.UnescapeDataString(uri.AbsolutePath.TrimStart('/')) };
        if (!uri.IsDefaultPort && uri.Port > 0)
        {
            builder.Port = uri.Port;
        }

        if (uri.UserInfo.Length > 0)
        {
            var parts = uri.UserInfo.Split(':', 2);
            builder.Username = Uri.UnescapeDataString(parts[0]);
            if (parts.Length == 2)
            {
                builder.Password = Uri.UnescapeDataString(parts[1]);
            }
        }

        foreach (var pair in uri.Query.TrimStart('?').Split('&', StringSplitOptions.RemoveEmptyEntries))
        {
            var kv = pair.Split('=', 2);
            var key = Uri.UnescapeDataString(kv[0]);
            var value = kv.Length == 2 ? Uri.UnescapeDataString(kv[1]) : "";
            try
            {
                builder[key switch { "sslmode" => "SSL Mode", "search_path" or "schema" => "Search Path", _ => key }] = value;
            }
            catch (ArgumentException)
            {
                throw new FormatException($"the server address has an option '{key}' that is not known; remove it or use a Host=...;Database=... string");
            }
        }

        return builder;
    }

    private static string Redacted(string text)
    {
        var at = text.IndexOf('@', StringComparison.Ordinal);
        var scheme = text.IndexOf("://", StringComparison.Ordinal);
        return at > scheme && scheme >= 0 && text.IndexOf(':', scheme + 3) is var colon && colon > 0 && colon < at
            ? text[..(colon + 1)] + "***" + text[at..]
            : text;
    }
}
