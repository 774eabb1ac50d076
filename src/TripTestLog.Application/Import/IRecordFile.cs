using TripTestLog.Application.Records;

namespace TripTestLog.Application.Import;

/// <summary>
/// One record file read in a single pass: its rows stream as records or problems, and the file's hash, row count and
/// file-level problems are known once the rows have been read. Disposing it closes the file.
/// </summary>
public interface IRecordFile : IDisposable
{
    /// <summary>The file's path, to read it from.</summary>
    string Path { get; }

    /// <summary>How records and problems cite the file (see <see cref="IRecordFileSource.Name"/>).</summary>
    string Name { get; }

    /// <summary>The kind recognised from the header; null when the file could not be read as a record file.</summary>
    RecordKind? Kind { get; }

    /// <summary>Streams the data rows, once, in file order.</summary>
    IEnumerable<ReadRow> Rows();

    /// <summary>Reads every row into memory: for small files (registers, tables) whose rules look across rows.</summary>
    ParsedFile ReadAll();

    /// <summary>What is known once the rows have been read: hash, rows read, file-level problems.</summary>
    FileSummary Summary { get; }

    /// <summary>
    /// A place for the rows an import refuses, written unchanged beside the file as they are found. Ask for it before
    /// reading the rows: from then on each row carries its raw text.
    /// </summary>
    IRejectsSink Rejects();
}

/// <summary>One data row: the record it parsed into, or its problems.</summary>
/// <param name="Line">The 1-based line the row starts on.</param>
/// <param name="Record">The record (a device, a measurement, a table row), or null when the row has problems.</param>
/// <param name="Problems">Why the row was refused; empty when it parsed.</param>
/// <param name="Raw">The row's text as written, when a rejects sink was asked for; else null.</param>
public readonly record struct ReadRow(long Line, ReadRecord? Record, IReadOnlyList<RowProblem> Problems, string? Raw = null)
{
    /// <summary>
    /// True for a row planned on a worksheet (its plan column filled) whose results were left blank: the test was not
    /// made. It is counted, never stored, and is no problem.
    /// </summary>
    public bool NotTested { get; init; }
}

/// <summary>A file as a whole, once read.</summary>
/// <param name="Sha256">SHA-256 of the file's bytes, lower-case hex.</param>
/// <param name="RowsRead">Data rows read (header and blank lines not counted).</param>
/// <param name="Problems">Problems with the file as a whole or across rows (malformed CSV, no data rows, table shape).</param>
/// <param name="IsUnreadable">True when not every row could be read, so the file is refused even where good rows would be accepted.</param>
public sealed record FileSummary(string Sha256, long RowsRead, IReadOnlyList<RowProblem> Problems, bool IsUnreadable);

/// <summary>Refused rows written unchanged with their reasons, so they can be fixed and imported on their own.</summary>
public interface IRejectsSink : IDisposable
{
    /// <summary>Writes <paramref name="row"/> as it was written, with its problems.</summary>
    void Write(ReadRow row, IReadOnlyList<RowProblem> problems);

    /// <summary>Keeps the file; returns its path, or null when no row was written. Without it, disposing deletes the file.</summary>
    string? Keep();
}
