namespace TripTestLog.Application.Records;

/// <summary>Why a row, or a whole file, was refused: where, and what to fix.</summary>
/// <param name="File">The file's path as given.</param>
/// <param name="Line">The 1-based line the row starts on (1 for the header).</param>
/// <param name="Column">The column's header text, or empty when the problem is with the whole row or file.</param>
/// <param name="Reason">What is wrong and what to write instead.</param>
public sealed record RowProblem(string File, long Line, string Column, string Reason)
{
    /// <summary>
    /// What kind of mistake this is, when many rows can share it (a decimal comma, one unknown tag): problems of one
    /// cause are reported together. Null when the reason itself says it.
    /// </summary>
    public string? Cause { get; init; }

    /// <summary>One line: file:line, column, reason.</summary>
    public override string ToString() =>
        Column.Length == 0 ? $"{File}:{Line}: {Reason}" : $"{File}:{Line}, column {Column}: {Reason}";
}
