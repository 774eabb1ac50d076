namespace TripTestLog.Cli.Output;

/// <summary>Which side of its column a cell keeps to: text to the left, numbers to the right.</summary>
internal enum ColumnAlignment
{
    Left,
    Right,
}
