namespace TripTestLog.Cli.Output;

internal sealed partial class TextTable
{
    /// <summary>
    /// Writes this table's rows to <paramref name="writer"/> as they come, at the widths its columns declare; the header is
    /// written with the first row, so no rows write nothing. A cell longer than its column is cut by the column's rule, or
    /// pushes its row out when the column has none.
    /// </summary>
    /// <exception cref="InvalidOperationException">A column does not declare its width.</exception>
    public RowStream StreamTo(TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        if (_columns.FirstOrDefault(c => c.Width is null) is { } unmeasured)
        {
            throw new InvalidOperationException($"a streamed table declares every column's width; '{unmeasured.Header}' has none");
        }

        return new RowStream(this, writer);
    }

    /// <summary>A table being written row by row; it holds no rows.</summary>
    internal sealed class RowStream
    {
        private readonly TextTable _table;
        private readonly TextWriter _writer;
        private readonly int[] _widths;
        private bool _started;

        internal RowStream(TextTable table, TextWriter writer)
        {
            _table = table;
            _writer = writer;
            _widths = [.. table._columns.Select(c => c.Width!.Value)];
        }

        /// <summary>Writes one row now, after the header when it is the first.</summary>
        /// <exception cref="ArgumentException">The row does not have one cell per column.</exception>
        public void Add(params string[] cells)
        {
            var shown = _table.Shown(cells);
            if (!_started)
            {
                _table.WriteHeader(_writer, _widths);
                _started = true;
            }

            _writer.WriteLine(_table.Line(shown, _widths));
        }
    }
}
