namespace TripTestLog.Application.Import;

/// <summary>How an import treats bad rows and corrected files.</summary>
/// <param name="AcceptValid">Store the good rows of a file with bad rows (the bad ones are reported as refused) instead of refusing the whole file.</param>
/// <param name="Replace">Apply a corrected file: rows that differ from the same lines of an earlier import from the same path replace the stored values, which are kept in the audit table.</param>
public sealed record ImportOptions(bool AcceptValid = false, bool Replace = false)
{
    /// <summary>The default: a file with any problem is refused whole; corrections are reported as conflicts.</summary>
    public static ImportOptions Strict { get; } = new();
}
