namespace TripTestLog.Storage.Entities;

/// <summary>An imported file: where every stored record came from.</summary>
internal sealed class SourceFileRow
{
    public long Id { get; set; }

    /// <summary>The file's name as shown: its path relative to the folder given to import (or as given).</summary>
    public string FileName { get; set; } = "";

    /// <summary>The full path it was read from on the importing machine: where verify looks, and what a correction matches.</summary>
    public string FullPath { get; set; } = "";

    public string Sha256 { get; set; } = "";

    public string Kind { get; set; } = "";

    public long RowsRead { get; set; }

    public long RecordsAdded { get; set; }

    public long Duplicates { get; set; }

    /// <summary>UTC, ISO 8601.</summary>
    public string ImportedAt { get; set; } = "";
}
