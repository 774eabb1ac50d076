namespace TripTestLog.Cli.Output;

/// <summary>
/// One column of a <see cref="TextTable"/>. A header may hold a line break: it is then printed over two lines, so a long
/// word does not widen its column of short numbers. Without a <see cref="Width"/> the column is as wide as its widest
/// cell; a column with a <see cref="Shortening"/> rule is the one that gives up width when the table is too wide.
/// </summary>
internal sealed record TextColumn
{
    private TextColumn(string header, ColumnAlignment alignment, int? width, Shortening shortening)
    {
        ArgumentNullException.ThrowIfNull(header);
        if (width is < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(width), width, "a column's width is at least 1");
        }

        // A middle cut keeps three characters, the mark and at least the last one.
        if (shortening != Shortening.None && width is < MinimumShortened)
        {
            throw new ArgumentOutOfRangeException(nameof(width), width, $"a column that shortens its cells is at least {MinimumShortened} wide");
        }

        Header = header;
        Alignment = alignment;
        Width = width;
        Shortening = shortening;
    }

    private const int MinimumShortened = 5;

    public string Header { get; }

    public ColumnAlignment Alignment { get; }

    /// <summary>The width in characters, fixed up front; null to measure it from the rows.</summary>
    public int? Width { get; }

    public Shortening Shortening { get; }

    /// <summary>The header's lines, top to bottom.</summary>
    public string[] HeaderLines => Header.Split('\n');

    public static TextColumn Left(string header, int? width = null, Shortening shortening = Shortening.None) =>
        new(header, ColumnAlignment.Left, width, shortening);

    public static TextColumn Right(string header, int? width = null, Shortening shortening = Shortening.None) =>
        new(header, ColumnAlignment.Right, width, shortening);

    /// <summary><paramref name="cell"/> padded to <paramref name="width"/>, and cut by this column's rule when longer.</summary>
    public string Fit(string cell, int width) => Pad(Cut(cell, width, Shortening), width);

    /// <summary><paramref name="text"/> padded to <paramref name="width"/> on the side away from its alignment; never cut.</summary>
    public string Pad(string text, int width) => Alignment == ColumnAlignment.Right ? text.PadLeft(width) : text.PadRight(width);

    /// <summary><paramref name="text"/> within <paramref name="width"/> characters by <paramref name="rule"/>, unchanged when it fits.</summary>
    public static string Cut(string text, int width, Shortening rule) => text.Length <= width ? text : rule switch
    {
        Shortening.Front => "…" + text[^(width - 1)..],
        Shortening.Middle => text[..3] + "…" + text[^(width - 4)..],
        Shortening.End => text[..(width - 1)] + "…",
        _ => text,
    };
}
