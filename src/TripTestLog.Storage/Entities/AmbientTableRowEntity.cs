namespace TripTestLog.Storage.Entities;

/// <summary>A stored ambient table row. The newest imported file that holds a table name defines that table.</summary>
internal sealed class AmbientTableRowEntity
{
    public long Id { get; set; }

    public string TableName { get; set; } = "";

    public double AmbientC { get; set; }

    public double CurrentFactor { get; set; }

    public long SourceFileId { get; set; }

    public long SourceLine { get; set; }
}
