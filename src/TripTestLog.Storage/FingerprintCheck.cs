namespace TripTestLog.Storage;

/// <summary>
/// Recomputes each stored measurement's fingerprint from its columns and counts those that no longer match: a value
/// changed outside the tool (by hand in SQL, or by damage the page checks did not see). Reads row by row.
/// </summary>
internal sealed class FingerprintCheck
{
    private const int Examples = 100;
    private readonly List<string> _examples = [];

    /// <summary>Records whose content no longer matches.</summary>
    public long Altered { get; private set; }

    /// <summary>The first hundred of them, as table, file and line.</summary>
    public IReadOnlyList<string> ExamplesFound => _examples;

    /// <summary>Checks one stored record of <paramref name="table"/>.</summary>
    public void Check(MeasurementTable table, object[] values, string stored, string? file, long line)
    {
        if (string.Equals(Fingerprint.Of(table, values), stored, StringComparison.OrdinalIgnoreCase))
        {
            return;
        }

        Altered++;
        if (_examples.Count < Examples)
        {
            _examples.Add($"{table.Table}: {file ?? "(no file)"} line {line}");
        }
    }

    /// <summary>The three measurement tables.</summary>
    public static MeasurementTable[] Tables => [MeasurementTable.Trips, MeasurementTable.Contacts, MeasurementTable.Insulations];
}
