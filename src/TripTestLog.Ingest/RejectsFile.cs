using System.Text;
using CsvHelper;
using TripTestLog.Application.Records;

namespace TripTestLog.Ingest;

/// <summary>
/// Writes the rows an import refused, unchanged, beside the input as NAME.rejects.csv: the original header with a
/// reject_reasons column added, then each refused row as it was written, with its reasons. Fix the rows there and
/// import that file.
/// </summary>
public static class RejectsFile
{
    /// <summary>The suffix of rejects files; folder imports skip such files.</summary>
    public const string Suffix = ".rejects.csv";

    /// <summary>The path the rejects of <paramref name="input"/> go to.</summary>
    public static string PathFor(string input) =>
        Path.Combine(Path.GetDirectoryName(Path.GetFullPath(input))!, Path.GetFileNameWithoutExtension(input) + Suffix);

    /// <summary>Writes the refused rows of <paramref name="input"/>; returns the path, or null when no row was refused.</summary>
    public static string? Write(string input, ReadOptions options, IReadOnlyList<RowProblem> problems)
    {
        var byLine = problems.Where(p => p.Line > 1).GroupBy(p => p.Line).ToDictionary(g => g.Key, g => string.Join("; ", g.Select(Reason)));
        if (byLine.Count == 0)
        {
            return null;
        }

        var layout = Layout.Recognise(input, options);
        var separator = layout.Separator;
        var output = PathFor(input);
        using var writer = new StreamWriter(output, false, new UTF8Encoding(false));
        using (var reader = new StreamReader(input, detectEncodingFromByteOrderMarks: true))
        {
            writer.Write(reader.ReadLine());
            writer.Write(separator + Columns.HeaderMap.RejectsColumn + "\n");
        }

        using var csv = CsvReader.FromFile(input, RecordFileReader.CsvOptions(separator));
        csv.ReadHeader();
        while (csv.Read())
        {
            if (byLine.TryGetValue(csv.LineNumber, out var reasons))
            {
                writer.Write(Encoding.UTF8.GetString(csv.RawRecord).TrimEnd('\r', '\n'));
                writer.Write(separator + Quote(reasons) + "\n");
            }
        }

        return output;
    }

    private static string Reason(RowProblem p) => p.Column.Length == 0 ? p.Reason : $"{p.Column}: {p.Reason}";

    private static string Quote(string text) => "\"" + text.Replace("\"", "\"\"") + "\"";
}
