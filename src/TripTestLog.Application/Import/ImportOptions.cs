namespace TripTestLog.Application.Import;

/// <summary>How an import treats bad rows and corrected files.</summary>
/// <param name="AcceptValid">Store the good rows of a file with bad rows (the bad ones are reported as refused) instead of refusing the whole file.</param>
/// <param name="Corrects">
/// Names the one earlier file the file imported corrects (its name, full path or hash prefix; see
/// <see cref="EarlierFiles.Find"/>). Without it a file is always a new file, whatever its path.
/// </param>
public sealed record ImportOptions(bool AcceptValid = false, string? Corrects = null)
{
    /// <summary>The default: a file with any problem is refused whole; every file is a new file.</summary>
    public static ImportOptions Strict { get; } = new();
}
