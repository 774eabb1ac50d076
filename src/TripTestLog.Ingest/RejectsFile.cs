namespace TripTestLog.Ingest;

/// <summary>
/// Where an import writes the rows it refused (<see cref="CsvRejectsSink"/>): NAME.rejects.csv beside the input, the
/// original header with a reject_reasons column added, then each refused row as it was written, with its reasons.
/// Fix the rows there and import that file.
/// </summary>
public static class RejectsFile
{
    /// <summary>The suffix of rejects files; folder imports skip such files.</summary>
    public const string Suffix = ".rejects.csv";

    /// <summary>The path the rejects of <paramref name="input"/> go to.</summary>
    public static string PathFor(string input) =>
        Path.Combine(Path.GetDirectoryName(Path.GetFullPath(input))!, Path.GetFileNameWithoutExtension(input) + Suffix);
}
