namespace TripTestLog.Storage.Entities;

/// <summary>A stored curve table row. The newest imported file that holds a table name defines that table.</summary>
internal sealed class CurveTableRowEntity
{
    public long Id { get; set; }

    public string TableName { get; set; } = "";

    public double Multiple { get; set; }

    public double MinS { get; set; }

    public double? MaxS { get; set; }

    public long SourceFileId { get; set; }

    public long SourceLine { get; set; }
}
