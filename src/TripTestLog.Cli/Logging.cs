using Serilog;
using Serilog.Core;

namespace TripTestLog.Cli;

/// <summary>The log file beside the database: everything a later reader needs to trace an import, nothing on the console.</summary>
internal static class Logging
{
    public static Logger BesideDatabase(Services.StoreAddress database)
    {
        // The folder exists: the address was refused otherwise (--db never creates folders).
        var folder = database.Folder;
        return new LoggerConfiguration()
            .MinimumLevel.Information()
            .WriteTo.File(Path.Combine(folder, "triptestlog.log"), shared: true,
                outputTemplate: "{Timestamp:yyyy-MM-ddTHH:mm:ss.fffzzz} [{Level:u3}] {Message:lj}{NewLine}{Exception}")
            .CreateLogger();
    }
}
