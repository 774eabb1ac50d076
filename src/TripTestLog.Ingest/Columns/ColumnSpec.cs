using TripTestLog.Application.Records;
namespace TripTestLog.Ingest.Columns;

/// <summary>One column of a record format: its name without the unit suffix, what it measures, and whether it is required.</summary>
/// <param name="Name">The column name without unit suffix, e.g. "trip_time".</param>
/// <param name="Quantity">What it measures; decides the accepted suffixes.</param>
/// <param name="Required">Whether every file of this kind must have the column.</param>
internal sealed record ColumnSpec(string Name, Quantity Quantity, bool Required)
{
    /// <summary>The name as it would be written with its first accepted suffix, for messages.</summary>
    public string Example => UnitSuffix.TakesSuffix(Quantity) ? $"{Name}{UnitSuffix.Accepted(Quantity).Split(' ')[0]}" : Name;
}
