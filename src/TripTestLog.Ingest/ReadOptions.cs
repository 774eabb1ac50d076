namespace TripTestLog.Ingest;

/// <summary>How a record file is read.</summary>
public sealed record ReadOptions
{
    /// <summary>The default largest file read: 100 MB. Files are stored whole in one transaction, so they are held in memory.</summary>
    public const long DefaultMaxBytes = 100L * 1024 * 1024;

    /// <summary>The defaults: separator and decimal mark recognised from the header, 100 MB at most, no profile.</summary>
    public static ReadOptions Default { get; } = new();

    /// <summary>The field separator; null to recognise it (a comma, or a semicolon with decimal commas).</summary>
    public char? Separator { get; init; }

    /// <summary>The decimal mark; null to follow the separator (',' files use '.', ';' files accept ',').</summary>
    public char? Decimal { get; init; }

    /// <summary>Files larger than this are refused with a message saying how to proceed.</summary>
    public long MaxBytes { get; init; } = DefaultMaxBytes;

    /// <summary>A column-mapping profile for another layout.</summary>
    public ColumnProfile? Profile { get; init; }
}
