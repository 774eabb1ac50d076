namespace TripTestLog.Cli.Output;

/// <summary>
/// The one writer of plain text tables: declared columns, two spaces between them, a rule of dashes under the header, no
/// colour and no box drawing, so a table reads the same in a terminal, a redirected file and a golden test file. Rows
/// are held and the columns measured from them (<see cref="WriteTo"/>), or, when every column declares its width,
/// written as they come (<see cref="StreamTo"/>) so memory stays flat however many there are. Cells are measured as
/// they will be shown: a control character counts as its code.
/// </summary>
internal sealed partial class TextTable
{
    private const string Gap = "  ";

    // An elastic column never gives up so much width that its header or a useful part of a name no longer fits.
    private const int MinimumElastic = 12;

    private readonly TextColumn[] _columns;
    private readonly List<(string[] Cells, string? Note)> _rows = [];

    /// <summary>A table of <paramref name="columns"/>; at most one of them may shorten its cells.</summary>
    /// <exception cref="ArgumentException">No columns, or more than one with a shortening rule.</exception>
    public TextTable(params TextColumn[] columns)
    {
        ArgumentNullException.ThrowIfNull(columns);
        if (columns.Length == 0)
        {
            throw new ArgumentException("a table needs at least one column", nameof(columns));
        }

        if (columns.Count(c => c.Shortening != Shortening.None) > 1)
        {
            throw new ArgumentException("at most one column of a table may shorten its cells", nameof(columns));
        }

        _columns = columns;
    }

    public int RowCount => _rows.Count;

    /// <summary>Holds a row for <see cref="WriteTo"/>.</summary>
    /// <exception cref="ArgumentException">The row does not have one cell per column.</exception>
    public void Add(params string[] cells) => _rows.Add((Shown(cells), null));

    /// <summary>Holds a row with a note written beneath it, wrapped within 100 columns and indented to the second column.</summary>
    /// <exception cref="ArgumentException">The row does not have one cell per column.</exception>
    public void Add(string[] cells, string note) => _rows.Add((Shown(cells), note));

    /// <summary>
    /// Writes the held rows within <paramref name="maxWidth"/> columns (a 100-column terminal unless asked otherwise): when
    /// the table is wider, the column with a shortening rule gives up the difference and its long cells are cut.
    /// </summary>
    public void WriteTo(TextWriter writer, int maxWidth = Wrapped.Width)
    {
        var widths = _columns.Select((c, i) => c.Width ?? Math.Max(c.HeaderLines.Max(p => p.Length), _rows.Count == 0 ? 0 : _rows.Max(r => r.Cells[i].Length))).ToArray();
        var total = widths.Sum() + Gap.Length * (widths.Length - 1);
        var elastic = Array.FindIndex(_columns, c => c.Shortening != Shortening.None);
        if (total > maxWidth && elastic >= 0)
        {
            var head = _columns[elastic].HeaderLines.Max(p => p.Length);
            widths[elastic] = Math.Max(Math.Max(head, MinimumElastic), widths[elastic] - (total - maxWidth));
        }

        WriteHeader(writer, widths);
        foreach (var (cells, note) in _rows)
        {
            writer.WriteLine(Line(cells, widths));
            if (note is not null)
            {
                Wrapped.Write(writer, note, widths[0] + Gap.Length);
            }
        }
    }

    private string[] Shown(string[] cells)
    {
        ArgumentNullException.ThrowIfNull(cells);
        if (cells.Length != _columns.Length)
        {
            throw new ArgumentException($"a row needs {_columns.Length} cells; got {cells.Length}", nameof(cells));
        }

        // Measured as it will be shown, so a value's control characters cannot push the table past its width.
        return [.. cells.Select(Visible.Text)];
    }

    private void WriteHeader(TextWriter writer, int[] widths)
    {
        var heads = _columns.Select(c => c.HeaderLines).ToArray();
        var lines = heads.Max(h => h.Length);
        for (var l = 0; l < lines; l++)
        {
            // A header of fewer lines sits on the last of them; a header is never cut.
            var cells = heads.Select((h, i) => _columns[i].Pad(l - (lines - h.Length) is var k && k >= 0 ? h[k] : "", widths[i]));
            writer.WriteLine(string.Join(Gap, cells).TrimEnd());
        }

        writer.WriteLine(string.Join(Gap, widths.Select(w => new string('-', w))));
    }

    private string Line(string[] cells, int[] widths) => string.Join(Gap, cells.Select((cell, i) => _columns[i].Fit(cell, widths[i]))).TrimEnd();
}
