namespace TripTestLog.Ingest;

/// <summary>How a record file is read.</summary>
public sealed record ReadOptions
{
    /// <summary>The defaults: separator and decimal mark recognised from the header, no size limit, no profile.</summary>
    public static ReadOptions Default { get; } = new();

    /// <summary>The field separator; null to recognise it (a comma, or a semicolon with decimal commas).</summary>
    public char? Separator { get; init; }

    /// <summary>The decimal mark; null to follow the separator (',' files use '.', ';' files accept ',').</summary>
    public char? Decimal { get; init; }

    /// <summary>
    /// Files larger than this are refused with a message saying how to proceed; no limit by default, since a file streams
    /// through the import and memory does not grow with its size.
    /// </summary>
    public long MaxBytes { get; init; } = long.MaxValue;

    /// <summary>A column-mapping profile for another layout.</summary>
    public ColumnProfile? Profile { get; init; }
}
