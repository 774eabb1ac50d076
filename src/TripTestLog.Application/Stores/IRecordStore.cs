using TripTestLog.Application.Check;
using TripTestLog.Application.Import;
using TripTestLog.Application.Register;
using TripTestLog.Application.Transfer;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Stores;

/// <summary>
/// Everything the tool asks of a database, in one seam: the import's write side, the streaming read the pipelines use,
/// a device's history, and the housekeeping commands. SQLite implements it today; a server database implements the
/// same contract, and nothing above it changes.
/// </summary>
public interface IRecordStore : IImportStore, ITripSource, IHistorySource, IRecordExport, IDisposable
{
    /// <summary>Where the store is, for messages and logs (a file path, or a server and database; never a password).</summary>
    string Location { get; }

    /// <summary>
    /// Every device's register entries, oldest first, by asset tag (compared as <see cref="AssetTag.Comparer"/> does);
    /// with <paramref name="only"/>, that device's alone (none when it is not in the register).
    /// </summary>
    IReadOnlyDictionary<string, DeviceHistory> Histories(AssetTag? only = null);

    /// <summary>How many of each thing the store holds.</summary>
    StoreCounts Counts();

    /// <summary>The database's own integrity checks, then the project's: every record traced to an imported file, each file still at hand unchanged.</summary>
    VerifyReport Verify();

    /// <summary>
    /// A consistent copy of the live database at <paramref name="destination"/>. A store whose database has its own
    /// backup tool refuses with a message that names it.
    /// </summary>
    void Backup(string destination);
}
