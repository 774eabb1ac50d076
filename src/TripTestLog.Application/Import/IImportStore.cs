using TripTestLog.Application.Records;

namespace TripTestLog.Application.Import;

/// <summary>The write side of a store, as the import pipeline needs it (SQLite today; a server database later).</summary>
public interface IImportStore
{
    /// <summary>
    /// Begins storing one measurement file in a transaction of its own; waits while another import holds the store.
    /// <paramref name="name"/> is how records will cite the file; <paramref name="path"/> where it was read from.
    /// <paramref name="corrects"/>, when given, names the earlier file this one corrects (see <see cref="EarlierFiles.Find"/>).
    /// </summary>
    IMeasurementBatch BeginMeasurements(RecordKind kind, string name, string path, DateTimeOffset now, string? corrects = null);

    /// <summary>
    /// Stores a small file read whole (a register, a curve or ambient table, the instrument register) in one transaction:
    /// its records as given, or nothing when a file with the same hash was imported before.
    /// </summary>
    ImportOutcome StoreSmallFile(ParsedFile file, DateTimeOffset now);
}

/// <summary>
/// One measurement file being stored, row by row, inside one transaction: all of it is kept by <see cref="Complete"/>,
/// or none of it when the batch is disposed first (a refusal, an error, Ctrl+C).
/// </summary>
public interface IMeasurementBatch : IDisposable
{
    /// <summary>
    /// Turns a measurement read from <paramref name="line"/> into the row the store will write (values, fingerprint),
    /// or null when the device register does not hold its tag. Pure and safe to call from another thread, so the
    /// pipeline prepares rows while the previous ones are written.
    /// </summary>
    PreparedRow? Prepare(MeasurementRecord measurement, long line);

    /// <summary>
    /// When the batch was begun to correct an earlier file that cannot be found, or is named ambiguously: the sentence
    /// saying so. The batch then stores nothing and is only disposed.
    /// </summary>
    string? Refusal { get; }

    /// <summary>The tags of the device register this batch checks against, to suggest the nearest to a mistyped one.</summary>
    IReadOnlyCollection<string> RegisterTags { get; }

    /// <summary>Stores a prepared row; an identical stored record makes it a duplicate (or, in a correction, an unchanged
    /// record of the corrected file), counted at the end.</summary>
    void Add(PreparedRow row);

    /// <summary>
    /// Commits the file with its hash and counts; not committed (and nothing stored) when a file with that hash was
    /// imported before. In a correction, pairs the corrected file's records with the new rows (see <see cref="BatchResult"/>).
    /// </summary>
    BatchResult Complete(string sha256, long rowsRead);
}

/// <summary>How a measurement file ended in the store.</summary>
/// <param name="Committed">False when a file with the same hash was imported before, so nothing was kept.</param>
/// <param name="Added">New records stored.</param>
/// <param name="Duplicates">Rows identical to a record already stored, or to an earlier row of the file.</param>
public sealed record BatchResult(bool Committed, long Added, long Duplicates)
{
    /// <summary>When not committed because the same content was imported before: the name it was imported under.</summary>
    public string? EarlierFile { get; init; }

    /// <summary>In a correction: the earlier file corrected, and what became of its records.</summary>
    public CorrectionResult? Correction { get; init; }
}

/// <summary>
/// What a correction did to the records of the earlier file it names. A record whose content the new file holds
/// again now cites the new file (unchanged); a record whose line the new file holds with other values took those
/// values, the old ones kept in the audit table (replaced); a record the new file no longer holds stays stored,
/// citing the earlier file, and is reported (kept).
/// </summary>
/// <param name="File">The earlier file's name as stored.</param>
/// <param name="Unchanged">Records held again with the same content.</param>
/// <param name="Replaced">Records that took new values.</param>
/// <param name="KeptLines">The lines of the earlier file whose records the new file does not hold (the first hundred).</param>
/// <param name="Kept">How many such records there are.</param>
public sealed record CorrectionResult(string File, long Unchanged, long Replaced, IReadOnlyList<long> KeptLines, long Kept);

/// <summary>A measurement as a store will write it; what it holds is the store's own business.</summary>
/// <param name="Line">The line of the file it was read from.</param>
public abstract record PreparedRow(long Line);
