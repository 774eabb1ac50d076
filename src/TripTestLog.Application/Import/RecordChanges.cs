namespace TripTestLog.Application.Import;

/// <summary>
/// What a correction changed in one record: every column whose value, written as text the way the audit trail keeps
/// it, differs between the stored record and the row that corrects it. A store writes the values as text (a device by
/// its tag, never the store's own id); this rule decides what counts as a change.
/// </summary>
public static class RecordChanges
{
    /// <summary>The changed columns, in column order, with the old and the new text.</summary>
    public static IEnumerable<(string Column, string Old, string New)> Between(IReadOnlyList<string> columns, IReadOnlyList<string> old, IReadOnlyList<string> corrected)
    {
        ArgumentNullException.ThrowIfNull(columns);
        ArgumentNullException.ThrowIfNull(old);
        ArgumentNullException.ThrowIfNull(corrected);
        for (var i = 0; i < columns.Count; i++)
        {
            if (!string.Equals(old[i], corrected[i], StringComparison.Ordinal))
            {
                yield return (columns[i], old[i], corrected[i]);
            }
        }
    }
}
