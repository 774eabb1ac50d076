using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using TripTestLog.Application.Records;

namespace TripTestLog.Application.Import;

/// <summary>The result of importing one file. Every data row read is accounted for.</summary>
/// <param name="File">The file's path as given.</param>
/// <param name="Kind">The kind recognised, when it was.</param>
/// <param name="Status">Imported, already imported, or refused.</param>
/// <param name="RowsRead">Data rows in the file.</param>
/// <param name="Added">New records stored (for a register: entries of devices new to the database, their settings history included).</param>
/// <param name="Updated">Register only: entries added to devices stored before (a revision was kept).</param>
/// <param name="Duplicates">Rows identical to a record already stored, or to an earlier row of the same file.</param>
/// <param name="Problems">Why the file, or (with accept-valid) some of its rows, were refused.</param>
public sealed record ImportOutcome(
    string File,
    RecordKind? Kind,
    ImportStatus Status,
    long RowsRead,
    long Added,
    long Updated,
    long Duplicates,
    IReadOnlyList<RowProblem> Problems)
{
    /// <summary>Rows refused while the rest of the file was stored (accept-valid), or every row when the file was refused.</summary>
    public long RefusedRows { get; init; }

    /// <summary>Where the refused rows were written (accept-valid), when any were.</summary>
    public string? RejectsFile { get; init; }

    /// <summary>Problems found beyond those kept in <see cref="Problems"/> (a report keeps the first ten thousand).</summary>
    public long ProblemsOmitted { get; init; }

    /// <summary>Stored records that took a correction's values (import --replace); their old values are in the audit table.</summary>
    public long Replaced { get; init; }

    /// <summary>For a file already imported: the name its content was first imported under (the same file, or a copy).</summary>
    public string? EarlierFile { get; init; }

    /// <summary>Rows planned on a worksheet and left blank: tests not made, counted and never stored.</summary>
    public long NotTested { get; init; }

    /// <summary>For a correction (import --replace): the earlier file corrected and what became of its records.</summary>
    public CorrectionResult? Correction { get; init; }

    /// <summary>Register rows that matched the stored entry exactly; in a correction, records of the corrected file held again unchanged.</summary>
    public long Unchanged => Status != ImportStatus.Imported ? 0
        : Kind == RecordKind.DeviceRegister ? RowsRead - Added - Updated - Duplicates - RefusedRows
        : Correction?.Unchanged ?? 0;
}
