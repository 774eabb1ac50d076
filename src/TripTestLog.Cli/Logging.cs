using Serilog;
using Serilog.Core;

namespace TripTestLog.Cli;

/// <summary>The log file beside the database: everything a later reader needs to trace an import, nothing on the console.</summary>
internal static class Logging
{
    /// <summary>The log beside <paramref name="database"/> (its folder exists: the address was refused otherwise, as --db never creates folders).</summary>
    public static Logger BesideDatabase(Services.StoreAddress database) => InFolder(database.Folder);

    /// <summary>The log file's path in <paramref name="folder"/>.</summary>
    public static string PathIn(string folder) => Path.Combine(folder, "triptestlog.log");

    /// <summary>The log in <paramref name="folder"/>, which exists.</summary>
    public static Logger InFolder(string folder) =>
        new LoggerConfiguration()
            .MinimumLevel.Information()
            .WriteTo.File(PathIn(folder), shared: true,
                outputTemplate: "{Timestamp:yyyy-MM-ddTHH:mm:ss.fffzzz} [{Level:u3}] {Message:lj}{NewLine}{Exception}")
            .CreateLogger();
}
