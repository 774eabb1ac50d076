using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Register;

/// <summary>One register entry of a device as it was imported: the entry, where it came from, and when.</summary>
/// <param name="Entry">The device as that register row described it.</param>
/// <param name="SourceFile">The register file, as records cite it.</param>
/// <param name="SourceLine">Its line there.</param>
/// <param name="RecordedAt">When the import kept it (UTC).</param>
public sealed record RegisterRevision(Device Entry, string SourceFile, long SourceLine, DateTimeOffset RecordedAt);

/// <summary>One value of a stored measurement that a corrected file replaced (import --replace).</summary>
/// <param name="Record">What the record is, e.g. "trip test 2025-03-06T09:00 at 8.78 A" or "contact test 2025-03-05 pole 1".</param>
/// <param name="Column">The column that changed.</param>
/// <param name="Old">Its value before.</param>
/// <param name="New">Its value after.</param>
/// <param name="OldFile">The file the old value came from.</param>
/// <param name="NewFile">The corrected file.</param>
/// <param name="ChangedAt">When the correction was applied (UTC).</param>
public sealed record RecordCorrection(string Record, string Column, string Old, string New, string OldFile, string NewFile, DateTimeOffset ChangedAt);

/// <summary>The read side a device's history needs (SQLite today; a server database later).</summary>
public interface IHistorySource
{
    /// <summary>Every register entry of <paramref name="tag"/>, oldest first; empty when it is not in the register.</summary>
    IReadOnlyList<RegisterRevision> Revisions(AssetTag tag);

    /// <summary>Every correction applied to <paramref name="tag"/>'s measurements, oldest first.</summary>
    IReadOnlyList<RecordCorrection> Corrections(AssetTag tag);
}
