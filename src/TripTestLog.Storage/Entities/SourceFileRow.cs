namespace TripTestLog.Storage.Entities;

/// <summary>An imported file: where every stored record came from.</summary>
internal sealed class SourceFileRow
{
    public long Id { get; set; }

    public string FileName { get; set; } = "";

    public string Sha256 { get; set; } = "";

    public string Kind { get; set; } = "";

    public long RowsRead { get; set; }

    public long RecordsAdded { get; set; }

    public long Duplicates { get; set; }

    /// <summary>UTC, ISO 8601.</summary>
    public string ImportedAt { get; set; } = "";
}
