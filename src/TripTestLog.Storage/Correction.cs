using TripTestLog.Application.Records;

namespace TripTestLog.Storage;

/// <summary>A row of a corrected file that differs from the row on the same line of the earlier file of that name.</summary>
/// <param name="New">The new row.</param>
/// <param name="StoredId">The stored record it would replace.</param>
/// <param name="Old">The stored values, aligned with the table's columns.</param>
/// <param name="OldSourceId">The source file the stored record came from.</param>
/// <param name="OldFile">That file's name.</param>
/// <param name="Columns">The table's columns.</param>
internal sealed record Correction(MeasurementRow New, long StoredId, object[] Old, long OldSourceId, string OldFile, string[] Columns)
{
    /// <summary>The columns whose values differ, with old and new text.</summary>
    public IEnumerable<(string Column, string Old, string New)> Changes =>
        Columns.Select((c, i) => (c, MeasurementTable.Text(Old[i]), MeasurementTable.Text(New.Values[i]))).Where(x => x.Item2 != x.Item3);

    public RowProblem Problem(string path)
    {
        // The problem names the record file's columns, which the person fixing it sees, not the table's.
        var changes = Changes.Select(c => (Column: RecordColumn(c.Column), c.Old, c.New)).ToList();
        var list = string.Join("; ", changes.Select(c => $"{c.Column} {Shown(c.Old)} -> {Shown(c.New)}"));
        return new RowProblem(path, New.Line, changes[0].Column,
            $"conflict: differs from line {New.Line} of the earlier import of {Path.GetFileName(OldFile)} ({list}); "
            + "if this is a correction, import again with --replace (the old values are kept in the audit table)");
    }

    private string RecordColumn(string column) =>
        Storage.RecordColumn.Of(column, Array.IndexOf(Columns, "tripped") is var i and >= 0 && New.Values[i] is true or 1L or 1);

    private static string Shown(string value) => value.Length == 0 ? "(blank)" : value;
}
