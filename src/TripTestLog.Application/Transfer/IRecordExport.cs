using TripTestLog.Application.Records;

namespace TripTestLog.Application.Transfer;

/// <summary>One imported file as a store keeps it: how records cite it, where it was read, its hash, kind and time.</summary>
/// <param name="Id">The store's own key for it (meaningless in another store).</param>
/// <param name="Name">How records cite it.</param>
/// <param name="FullPath">Where it was read from on the machine that imported it.</param>
/// <param name="Sha256">Its content hash, lower-case hex.</param>
/// <param name="Kind">What it holds.</param>
/// <param name="RowsRead">The data rows it had.</param>
/// <param name="ImportedAt">When it was imported (UTC).</param>
public sealed record StoredFile(long Id, string Name, string FullPath, string Sha256, RecordKind Kind, long RowsRead, DateTimeOffset ImportedAt);

/// <summary>One value a corrected file replaced, as a store can hand it to another: the record by its fingerprint, the files by their hashes.</summary>
/// <param name="Table">The record's table.</param>
/// <param name="RecordFingerprint">The corrected record's fingerprint (its content hash, as now stored).</param>
/// <param name="Column">The column that changed.</param>
/// <param name="Old">Its value before.</param>
/// <param name="New">Its value after.</param>
/// <param name="OldFileSha256">The file the old value came from.</param>
/// <param name="NewFileSha256">The corrected file.</param>
/// <param name="ChangedAt">When the correction was applied (UTC).</param>
public sealed record StoredChange(string Table, string RecordFingerprint, string Column, string Old, string New, string OldFileSha256, string NewFileSha256, DateTimeOffset ChangedAt);

/// <summary>
/// What a store gives up to be copied into another: its imported files, oldest first, each with the records that now
/// trace to it, and the trail of corrections; and what it takes of a copied trail.
/// </summary>
public interface IRecordExport
{
    /// <summary>Every imported file, oldest first.</summary>
    IEnumerable<StoredFile> Files();

    /// <summary>
    /// The records that trace to <paramref name="file"/>, by line: devices for a register, measurements, curve or ambient
    /// table rows, or instrument calibrations. Streamed: a measurement file is never held whole.
    /// </summary>
    IEnumerable<Located<ReadRecord>> Records(StoredFile file);

    /// <summary>Every correction, oldest first.</summary>
    IEnumerable<StoredChange> Changes();

    /// <summary>Keeps the corrections of another store whose records and files this one now holds; one it holds already is skipped. Returns how many it added.</summary>
    long AddChanges(IEnumerable<StoredChange> changes);
}
