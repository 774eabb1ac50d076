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

    private readonly TextWriter _writer;

    public VerdictCsv(TextWriter writer)
    {
        _writer = writer;
        _writer.WriteLine(string.Join(',', Fields.Select(f => JsonNamingPolicy.SnakeCaseLower.ConvertName(f.Name))));
    }

    public void Add(JudgedTrip judged)
    {
        var row = VerdictJson.Row(judged);
        _writer.WriteLine(string.Join(',', Fields.Select(f => f.GetValue(row) switch
        {
            null => "",
            double d => d.ToString("R", CultureInfo.InvariantCulture),
            long l => l.ToString(CultureInfo.InvariantCulture),
            bool b => b ? "true" : "false",
            string s => CsvCell.Text(s),
            IEnumerable<string> list => CsvCell.Text(string.Join("; ", list)),
            var other => CsvCell.Text(Convert.ToString(other, CultureInfo.InvariantCulture)),
        })));
    }

    public void Finish()
    {
    }
}
