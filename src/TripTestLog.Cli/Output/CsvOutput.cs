using System.Globalization;
using System.Text;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The one way this tool writes CSV: a header of names in the order the caller declares, then rows of cells, each line
/// written as soon as it ends. Every cell passes one formatting rule: nothing for null, numbers in invariant round-trip
/// form (a negative number stays a number), <c>true</c>/<c>false</c>, a list joined with "; ", and text through
/// <see cref="CsvCell"/>, which quotes it where needed and neutralises what a spreadsheet would run as a formula.
/// </summary>
internal sealed class CsvOutput(TextWriter writer)
{
    private readonly StringBuilder _line = new(512);
    private bool _inRow;

    /// <summary>Writes the header line: <paramref name="names"/> as given (they are the tool's own field names).</summary>
    public void Header(IEnumerable<string> names) => writer.WriteLine(string.Join(',', names));

    /// <summary>Adds one cell to the row being built.</summary>
    public CsvOutput Cell(object? value)
    {
        if (_inRow)
        {
            _line.Append(',');
        }

        _inRow = true;
        switch (value)
        {
            case null:
                break;
            case double d:
                _line.Append(d.ToString("R", CultureInfo.InvariantCulture));
                break;
            case long l:
                _line.Append(l.ToString(CultureInfo.InvariantCulture));
                break;
            case int i:
                _line.Append(i.ToString(CultureInfo.InvariantCulture));
                break;
            case bool b:
                _line.Append(b ? "true" : "false");
                break;
            case CsvNumber n:
                _line.Append(n.Text);
                break;
            case string text:
                _line.Append(CsvCell.Text(text));
                break;
            case IEnumerable<string> list:
                _line.Append(CsvCell.Text(string.Join("; ", list)));
                break;
            case var other:
                _line.Append(CsvCell.Text(Convert.ToString(other, CultureInfo.InvariantCulture)));
                break;
        }

        return this;
    }

    /// <summary>Writes the row built since the last one.</summary>
    public void EndRow()
    {
        writer.WriteLine(_line);
        _line.Clear();
        _inRow = false;
    }
}

/// <summary>A number the caller has already formatted (e.g. a planned current to six decimals): written as it is, never neutralised.</summary>
internal readonly record struct CsvNumber(string Text);
