using System.Text;

namespace TripTestLog.Cli.Output;

/// <summary>
/// A plain text table with aligned columns, no colour and no box drawing, so it reads the same in a terminal, a
/// redirected file and a golden test file.
/// </summary>
internal sealed class TextTable
{
    private readonly string[] _headers;
    private readonly bool[] _rightAligned;
    private readonly List<string[]> _rows = [];

    /// <summary>
    /// Columns whose header ends with '>' are right-aligned (the marker is not printed). A header may hold a line break:
    /// it is then printed over two lines, so a long word does not widen its column of short numbers.
    /// </summary>
    public TextTable(params string[] headers)
    {
        _rightAligned = headers.Select(h => h.EndsWith('>')).ToArray();
        _headers = headers.Select(h => h.TrimEnd('>')).ToArray();
    }

    public int RowCount => _rows.Count;

    public void Add(params string[] cells)
    {
        if (cells.Length != _headers.Length)
        {
            throw new ArgumentException($"a row needs {_headers.Length} cells; got {cells.Length}", nameof(cells));
        }

        // Measured as it will be shown, so a value's control characters cannot push the table past its width.
        _rows.Add([.. cells.Select(Visible.Text)]);
    }

    /// <summary>
    /// The column that gives up width when the table is too wide: the first (a file name, shortened from the front so the
    /// end of a path, the part that tells files apart, stays) unless set; any other is shortened at its end.
    /// </summary>
    public int Elastic { get; init; }

    /// <summary>
    /// Writes the table within <paramref name="maxWidth"/> columns (a 100-column terminal unless asked otherwise): when it
    /// is wider, the <see cref="Elastic"/> column gives up the difference, its long cells shortened with '…'.
    /// </summary>
    public void WriteTo(TextWriter writer, int maxWidth = Wrapped.Width)
    {
        var heads = _headers.Select(h => h.Split('\n')).ToArray();
        var widths = heads.Select((h, i) => Math.Max(h.Max(p => p.Length), _rows.Count == 0 ? 0 : _rows.Max(r => r[i].Length))).ToArray();
        var total = widths.Sum() + 2 * (widths.Length - 1);
        var e = Elastic;
        if (total > maxWidth)
        {
            widths[e] = Math.Max(Math.Max(heads[e].Max(p => p.Length), 12), widths[e] - (total - maxWidth));
        }

        var lines = heads.Max(h => h.Length);
        for (var l = 0; l < lines; l++)
        {
            // A header of fewer lines sits on the last of them.
            writer.WriteLine(Line([.. heads.Select(h => l - (lines - h.Length) is var k && k >= 0 ? h[k] : "")], widths));
        }

        writer.WriteLine(string.Join("  ", widths.Select(w => new string('-', w))));
        foreach (var row in _rows)
        {
            if (row[e].Length > widths[e])
            {
                var cells = (string[])row.Clone();
                cells[e] = e == 0 ? "…" + row[e][^(widths[e] - 1)..] : row[e][..(widths[e] - 1)] + "…";
                writer.WriteLine(Line(cells, widths));
            }
            else
            {
                writer.WriteLine(Line(row, widths));
            }
        }
    }

    private string Line(string[] cells, int[] widths)
    {
        var sb = new StringBuilder();
        for (var i = 0; i < cells.Length; i++)
        {
            if (i > 0)
            {
                sb.Append("  ");
            }

            sb.Append(_rightAligned[i] ? cells[i].PadLeft(widths[i]) : cells[i].PadRight(widths[i]));
        }

        return sb.ToString().TrimEnd();
    }
}
