using TripTestLog.Domain.Records;
using CsvHelper;
using TripTestLog.Ingest.Columns;
using TripTestLog.Ingest.Rows;

namespace TripTestLog.Ingest;

/// <summary>
/// Reads one record file of any kind: recognises the kind from its header, parses every row, and returns the records
/// with every problem found. Never throws for bad content; a problem names the file, line, column and what to fix.
/// </summary>
public static class RecordFileReader
{
    /// <summary>Reads <paramref name="path"/>; dates after <paramref name="today"/> are refused as future dates.</summary>
    /// <exception cref="IOException">When the file cannot be opened at all.</exception>
    public static ParsedFile Read(string path, DateOnly today)
    {
        var sha = FileHash.Sha256(path);
        var fileProblem = CheckReadable(path);
        if (fileProblem is not null)
        {
            return new ParsedFile { Path = path, Sha256 = sha, Problems = [new RowProblem(path, 1, "", fileProblem)] };
        }

        var options = new CsvReaderOptions
        {
            HasHeader = true,
            Separator = ',',
            TrackLineNumbers = true,
            FieldCountMismatch = CsvFieldCountHandling.Allow,
            MalformedData = CsvMalformedDataHandling.Throw,
        };
        using var csv = CsvReader.FromFile(path, options);
        csv.ReadHeader();
        var (map, headerProblems) = HeaderMap.Resolve(csv.Headers);
        if (map is null)
        {
            return new ParsedFile
            {
                Path = path,
                Sha256 = sha,
                Problems = headerProblems.Select(p => new RowProblem(path, 1, p.Column, p.Reason)).ToList(),
            };
        }

        var sink = new RowSink(map.Schema.Kind);
        var problems = new List<RowProblem>();
        long rows = 0;
        var values = new List<string>();
        try
        {
            while (csv.Read())
            {
                rows++;
                values.Clear();
                for (var i = 0; i < csv.FieldCount; i++)
                {
                    values.Add(csv.GetString(i));
                }

                if (values.Count != csv.Headers.Count)
                {
                    problems.Add(new RowProblem(path, csv.LineNumber, "",
                        $"this row has {values.Count} fields but the header has {csv.Headers.Count}; check for a missing or extra comma, or quote fields that hold commas"));
                    continue;
                }

                var fields = new RowFields(map, values, path, csv.LineNumber, today);
                sink.Add(fields);
                problems.AddRange(fields.Problems);
            }
        }
        catch (CsvFormatException e)
        {
            problems.Add(new RowProblem(path, e.LineNumber, "", $"the CSV is malformed here ({Describe(e)}); reading stopped"));
        }

        problems.AddRange(sink.TableProblems(path));
        if (rows == 0 && problems.Count == 0)
        {
            problems.Add(new RowProblem(path, 1, "", $"the file has a {HeaderMap.Describe(map.Schema.Kind)} header but no data rows"));
        }

        return sink.ToParsedFile(path, sha, rows, problems);
    }

    private static string? CheckReadable(string path)
    {
        var head = new byte[8192];
        int read;
        using (var stream = File.OpenRead(path))
        {
            read = stream.ReadAtLeast(head, head.Length, throwOnEndOfStream: false);
        }

        if (read == 0)
        {
            return "the file is empty; a record file needs a header row and at least one data row";
        }

        return Array.IndexOf(head, (byte)0, 0, read) >= 0
            ? "this is not a text file (it holds NUL bytes); export the records as UTF-8 CSV"
            : null;
    }

    private static string Describe(CsvFormatException e)
    {
        // CsvHelper's message starts with its own location; the problem already carries the line.
        var message = e.Message;
        var colon = message.IndexOf("): ", StringComparison.Ordinal);
        return colon >= 0 ? message[(colon + 3)..].TrimEnd('.') : message;
    }
}
