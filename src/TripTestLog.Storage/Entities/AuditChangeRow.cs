namespace TripTestLog.Storage.Entities;

/// <summary>One value a corrected file replaced (import --replace): what it was, what it became, and from which files.</summary>
internal sealed class AuditChangeRow
{
    public long Id { get; set; }

    public string TableName { get; set; } = "";

    public long RecordId { get; set; }

    public string ColumnName { get; set; } = "";

    public string OldValue { get; set; } = "";

    public string NewValue { get; set; } = "";

    public long OldSourceFileId { get; set; }

    public long NewSourceFileId { get; set; }

    /// <summary>UTC, ISO 8601.</summary>
    public string ChangedAt { get; set; } = "";
}
