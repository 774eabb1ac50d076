using System.Globalization;

namespace TripTestLog.Domain.Measurements;

/// <summary>
/// When a test was made, as the test set wrote it: a date, or a date and time, optionally with a UTC offset.
/// Kept as written so that a local site time is never shifted by the machine that imports it.
/// </summary>
public readonly record struct TestedAt : IComparable<TestedAt>
{
    private static readonly string[] Formats =
    [
        "yyyy-MM-dd", "yyyy-MM-ddTHH:mm", "yyyy-MM-ddTHH:mm:ss", "yyyy-MM-dd HH:mm", "yyyy-MM-dd HH:mm:ss",
        "yyyy-MM-ddTHH:mmK", "yyyy-MM-ddTHH:mm:ssK", "yyyy-MM-ddTHH:mm:ss.FFFFFFF", "yyyy-MM-ddTHH:mm:ss.FFFFFFFK",
    ];

    private TestedAt(DateTime local, TimeSpan? offset, bool hasTime)
    {
        Local = local;
        Offset = offset;
        HasTime = hasTime;
    }

    /// <summary>The date and time as written (no time zone conversion).</summary>
    public DateTime Local { get; }

    /// <summary>The UTC offset when the record gave one.</summary>
    public TimeSpan? Offset { get; }

    /// <summary>Whether the record gave a time of day, not only a date.</summary>
    public bool HasTime { get; }

    /// <summary>The calendar date of the test.</summary>
    public DateOnly Date => DateOnly.FromDateTime(Local);

    /// <summary>A date-only value.</summary>
    public static TestedAt OnDate(DateOnly date) => new(date.ToDateTime(TimeOnly.MinValue), null, false);

    /// <summary>A local date and time with no offset.</summary>
    public static TestedAt At(DateTime local) => new(DateTime.SpecifyKind(local, DateTimeKind.Unspecified), null, true);

    /// <summary>A test time from its parts, as a store that keeps them apart gives them back.</summary>
    /// <param name="local">The date and time as written.</param>
    /// <param name="offset">The UTC offset, when the record gave one.</param>
    /// <param name="hasTime">Whether the record gave a time of day; without one, only the date of <paramref name="local"/> counts.</param>
    public static TestedAt Of(DateTime local, TimeSpan? offset, bool hasTime) =>
        hasTime ? new(DateTime.SpecifyKind(local, DateTimeKind.Unspecified), offset, true) : OnDate(DateOnly.FromDateTime(local));

    /// <summary>Reads an ISO 8601 date or date-time; returns false for anything else.</summary>
    public static bool TryParse(string text, out TestedAt value)
    {
        value = default;
        var trimmed = text.Trim();

        // The shapes test sets write most, tried first: one format costs a fraction of trying the whole list.
        var likely = trimmed.Length switch
        {
            10 => "yyyy-MM-dd",
            16 when trimmed[10] == 'T' => "yyyy-MM-ddTHH:mm",
            19 when trimmed[10] == 'T' => "yyyy-MM-ddTHH:mm:ss",
            _ => null,
        };
        if (!(likely is not null && DateTimeOffset.TryParseExact(trimmed, likely, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal, out var parsed))
            && !DateTimeOffset.TryParseExact(trimmed, Formats, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal, out parsed))
        {
            return false;
        }

        var hasTime = trimmed.Length > 10;
        var hasOffset = hasTime && (trimmed.EndsWith('Z') || trimmed.LastIndexOfAny(['+', '-']) > 10);
        value = new TestedAt(DateTime.SpecifyKind(parsed.DateTime, DateTimeKind.Unspecified), hasOffset ? parsed.Offset : null, hasTime);
        return true;
    }

    /// <summary>Reads an ISO 8601 date or date-time; throws <see cref="FormatException"/> for anything else.</summary>
    public static TestedAt Parse(string text) =>
        TryParse(text, out var value) ? value : throw new FormatException($"'{text}' is not an ISO 8601 date or date-time.");

    /// <inheritdoc />
    public int CompareTo(TestedAt other) => Local.CompareTo(other.Local);

    /// <summary>ISO 8601 text: the date alone, or the date and time with the offset when one was given.</summary>
    public override string ToString()
    {
        if (!HasTime)
        {
            return Local.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
        }

        var text = Local.ToString("yyyy-MM-ddTHH:mm:ss", CultureInfo.InvariantCulture);
        return Offset is { } offset
            ? new DateTimeOffset(Local, offset).ToString("yyyy-MM-ddTHH:mm:sszzz", CultureInfo.InvariantCulture)
            : text;
    }
}
