using System.Text;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;

namespace TripTestLog.Ingest;

/// <summary>
/// Writes the rows an import refuses, unchanged, beside the input as NAME.rejects.csv, while the file is read: the
/// original header with a reject_reasons column added, then each refused row as it was written, with its reasons.
/// The file is written under a temporary name and only takes its name when the import keeps it.
/// </summary>
internal sealed class CsvRejectsSink(CsvRecordFile file) : IRejectsSink
{
    private readonly string _final = RejectsFile.PathFor(file.Path);
    private StreamWriter? _writer;
    private string? _temporary;

    public void Write(ReadRow row, IReadOnlyList<RowProblem> problems)
    {
        if (row.Line <= 1)
        {
            return;
        }

        if (_writer is null)
        {
            _temporary = _final + ".partial";
            _writer = new StreamWriter(_temporary, false, new UTF8Encoding(false));
            _writer.Write(file.HeaderText + file.Separator + Columns.HeaderMap.RejectsColumn + "\n");
        }

        _writer.Write(row.Raw ?? throw new InvalidOperationException("ask for the rejects sink before reading the rows"));
        _writer.Write(file.Separator + Quote(string.Join("; ", problems.Select(Reason))) + "\n");
    }

    public string? Keep()
    {
        if (_writer is null)
        {
            return null;
        }

        _writer.Dispose();
        _writer = null;
        File.Move(_temporary!, _final, overwrite: true);
        _temporary = null;
        return _final;
    }

    public void Dispose()
    {
        _writer?.Dispose();
        if (_temporary is not null && File.Exists(_temporary))
        {
            File.Delete(_temporary);
        }
    }

    private static string Reason(RowProblem p) => p.Column.Length == 0 ? p.Reason : $"{p.Column}: {p.Reason}";

    private static string Quote(string text) => "\"" + text.Replace("\"", "\"\"") + "\"";
}
