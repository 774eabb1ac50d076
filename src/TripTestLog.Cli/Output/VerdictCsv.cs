using System.Text.Json.Serialization.Metadata;
using TripTestLog.Application.Check;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The verdicts as CSV: the `check --json` fields in the same order and with the same names, one row per trip test;
/// lists joined with "; ", text cells neutralised against spreadsheet formulas.
/// </summary>
/// <remarks>
/// The columns are the JSON contract's properties (<see cref="VerdictJsonContext"/>, made at build time): the same
/// names and the same order as the JSON by construction, in the order the row declares them, with no reflection.
/// Adding a field to <see cref="VerdictJson.VerdictRow"/> adds it to both files.
/// </remarks>
internal sealed class VerdictCsv : IVerdictWriter
{
    private static readonly IReadOnlyList<JsonPropertyInfo> Fields = VerdictJsonContext.Default.VerdictRow.Properties.OrderBy(p => p.Order).ToArray();

    private readonly CsvOutput _csv;
    private readonly VerdictRows? _rows;

    /// <summary>Writes to <paramref name="writer"/>; given <paramref name="rows"/>, takes each test's row from there.</summary>
    public VerdictCsv(TextWriter writer, VerdictRows? rows = null)
    {
        _csv = new CsvOutput(writer);
        _rows = rows;
        _csv.Header(Fields.Select(f => f.Name));
    }

    public void Add(JudgedTrip judged)
    {
        object row = _rows is { } shared ? shared.Of(judged) : VerdictJson.Row(judged);
        foreach (var field in Fields)
        {
            _csv.Cell(field.Get!(row));
        }

        _csv.EndRow();
    }

    public void Finish()
    {
    }
}
