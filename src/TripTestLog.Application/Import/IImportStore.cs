using TripTestLog.Application.Records;

namespace TripTestLog.Application.Import;

/// <summary>The write side of a store, as the import pipeline needs it (SQLite today; a server database later).</summary>
public interface IImportStore
{
    /// <summary>
    /// Begins storing one measurement file in a transaction of its own; waits while another import holds the store.
    /// <paramref name="name"/> is how records will cite the file; <paramref name="path"/> where it was read from.
    /// </summary>
    IMeasurementBatch BeginMeasurements(RecordKind kind, string name, string path, DateTimeOffset now);

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
    PreparedRow? Prepare(object measurement, long line);

    /// <summary>Stores a prepared row (an identical stored record makes it a duplicate, counted at the end), unless the
    /// line differs from the same line of an earlier import from the same path: then it answers with the conflict.</summary>
    RowAnswer Add(PreparedRow row);

    /// <summary>Applies a correction that <see cref="Add"/> answered with a conflict: the stored record takes the new values
    /// and its old ones are kept in the audit table.</summary>
    void Replace(PreparedRow row);

    /// <summary>
    /// Commits the file with its hash and counts; not committed (and nothing stored) when a file with that hash was
    /// imported before. <paramref name="replaced"/> corrections count as stored records.
    /// </summary>
    BatchResult Complete(string sha256, long rowsRead, long replaced);
}

/// <summary>How a measurement file ended in the store.</summary>
/// <param name="Committed">False when a file with the same hash was imported before, so nothing was kept.</param>
/// <param name="Added">New records stored.</param>
/// <param name="Duplicates">Rows identical to a record already stored, or to an earlier row of the file.</param>
public sealed record BatchResult(bool Committed, long Added, long Duplicates)
{
    /// <summary>When not committed because the same content was imported before: the name it was imported under.</summary>
    public string? EarlierFile { get; init; }
}

/// <summary>A measurement as a store will write it; what it holds is the store's own business.</summary>
/// <param name="Line">The line of the file it was read from.</param>
public abstract record PreparedRow(long Line);

/// <summary>What the store did with one row.</summary>
public enum RowAnswerKind
{
    /// <summary>Stored, or found identical to a stored record (the batch counts which).</summary>
    Stored,

    /// <summary>Differs from the same line of an earlier import from the same path: a correction, not stored.</summary>
    Conflict,
}

/// <summary>The store's answer for one row; for a conflict, the column that differs first and the words to report.</summary>
/// <param name="Kind">Added, duplicate or conflict.</param>
/// <param name="Column">For a conflict: the first column that differs.</param>
/// <param name="Reason">For a conflict: what differs and how to apply it.</param>
public readonly record struct RowAnswer(RowAnswerKind Kind, string Column = "", string Reason = "")
{
    /// <summary>Stored, or a duplicate.</summary>
    public static RowAnswer Stored => new(RowAnswerKind.Stored);
}
