using System.Globalization;
using System.Reflection;
using System.Text.Json;
using TripTestLog.Application.Check;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The verdicts as CSV: the `check --json` fields in the same order and with the same names, one row per trip test;
/// lists joined with "; ", text cells neutralised against spreadsheet formulas.
/// </summary>
internal sealed class VerdictCsv : IVerdictWriter
{
    private static readonly PropertyInfo[] Fields = typeof(VerdictJson.VerdictRow).GetProperties(BindingFlags.Public | BindingFlags.Instance)
        .Where(p => p.Name != "EqualityContract").ToArray();

    // Getters compiled once: a million-row report reads 30 fields a row, and reflection per read is the slow part.
    private static readonly Func<VerdictJson.VerdictRow, object?>[] Getters = [.. Fields.Select(Getter)];

    private readonly System.Text.StringBuilder _line = new(512);

    private readonly TextWriter _writer;

    public VerdictCsv(TextWriter writer)
    {
        _writer = writer;
        _writer.WriteLine(string.Join(',', Fields.Select(f => JsonNamingPolicy.SnakeCaseLower.ConvertName(f.Name))));
    }

    public void Add(JudgedTrip judged)
    {
        var row = VerdictJson.Row(judged);
        _line.Clear();
        for (var i = 0; i < Getters.Length; i++)
        {
            if (i > 0)
            {
                _line.Append(',');
            }

            switch (Getters[i](row))
            {
                case null:
                    break;
                case double d:
                    _line.Append(d.ToString("R", CultureInfo.InvariantCulture));
                    break;
                case long l:
                    _line.Append(l.ToString(CultureInfo.InvariantCulture));
                    break;
                case bool b:
                    _line.Append(b ? "true" : "false");
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
        }

        _writer.WriteLine(_line);
    }

    private static Func<VerdictJson.VerdictRow, object?> Getter(PropertyInfo property)
    {
        var row = System.Linq.Expressions.Expression.Parameter(typeof(VerdictJson.VerdictRow));
        var body = System.Linq.Expressions.Expression.Convert(System.Linq.Expressions.Expression.Property(row, property), typeof(object));
        return System.Linq.Expressions.Expression.Lambda<Func<VerdictJson.VerdictRow, object?>>(body, row).Compile();
    }

    public void Finish()
    {
    }
}
