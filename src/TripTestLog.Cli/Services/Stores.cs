using TripTestLog.Application.Stores;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Services;

/// <summary>
/// Opens the store a command names. The one place the executable chooses a database: the embedded SQLite file today; a
/// server database is a second implementation of <see cref="IRecordStore"/> chosen here by its connection string.
/// </summary>
internal static class Stores
{
    /// <summary>Opens (and, for a new SQLite file, creates and migrates) the store at <paramref name="path"/>.</summary>
    public static IRecordStore Open(string path) => RecordStore.Open(path);
}
