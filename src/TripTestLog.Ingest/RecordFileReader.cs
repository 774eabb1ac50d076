using System.Text;
using CsvHelper;
using TripTestLog.Application.Records;
using TripTestLog.Ingest.Columns;
using TripTestLog.Ingest.Rows;

namespace TripTestLog.Ingest;

/// <summary>
/// Reads one record file of any kind: recognises the kind from its header, parses every row, and returns the records
/// with every problem found. Never throws for bad content; a problem names the file, line, column and what to fix.
/// </summary>
public static class RecordFileReader
{
    /// <summary>Reads <paramref name="path"/> with the default options.</summary>
    public static ParsedFile Read(string path, DateOnly today) => Read(path, today, ReadOptions.Default);

    /// <summary>Reads <paramref name="path"/>; dates after <paramref name="today"/> are refused as future dates.</summary>
    /// <exception cref="IOException">When the file cannot be opened at all.</exception>
    public static ParsedFile Read(string path, DateOnly today, ReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        var sha = FileHash.Sha256(path);
        if (CheckReadable(path, options.MaxBytes) is { } fileProblem)
        {
            return Unreadable(path, sha, 1, "", fileProblem);
        }

        var layout = Layout.Recognise(path, options);
        if (layout.Problem is { } layoutProblem)
        {
            return Unreadable(path, sha, 1, "", layoutProblem);
        }

        using var csv = CsvReader.FromFile(path, CsvOptions(layout.Separator));
        csv.ReadHeader();
        var headers = layout.Headers(csv.Headers);
        var (map, headerProblems) = HeaderMap.Resolve(headers.Names);
        if (map is null)
        {
            return new ParsedFile
            {
                Path = path,
                Sha256 = sha,
                IsUnreadable = true,
                Problems = headerProblems.Select(p => new RowProblem(path, 1, p.Column, p.Reason)).ToList(),
            };
        }

        var sink = new RowSink(map.Schema.Kind);
        var problems = new List<RowProblem>();
        long rows = 0;
        var unreadable = false;
        try
        {
            while (csv.Read())
            {
                rows++;
                if (csv.FieldCount != csv.Headers.Count)
                {
                    problems.Add(new RowProblem(path, csv.LineNumber, "",
                        $"this row has {csv.FieldCount} fields but the header has {csv.Headers.Count}; check for a missing or extra "
                        + $"'{layout.Separator}', or quote fields that hold one"));
                    continue;
                }

                var fields = new RowFields(map, headers.Values(csv), path, csv.LineNumber, today, layout.DecimalComma, options.Profile?.DateFormats ?? []);
                sink.Add(fields);
                problems.AddRange(fields.Problems);
            }
        }
        catch (CsvFormatException e)
        {
            // Past a malformed record the rest of the file cannot be read, so its rows cannot be accounted for.
            unreadable = true;
            problems.Add(new RowProblem(path, e.LineNumber, "", $"the CSV is malformed here ({Describe(e)}); reading stopped, so the file is refused"));
        }

        problems.AddRange(sink.TableProblems(path));
        if (rows == 0 && problems.Count == 0)
        {
            unreadable = true;
            problems.Add(new RowProblem(path, 1, "", $"the file has a {HeaderMap.Describe(map.Schema.Kind)} header but no data rows"));
        }

        return sink.ToParsedFile(path, sha, rows, problems) with { IsUnreadable = unreadable };
    }

    /// <summary>
    /// The kind of <paramref name="path"/> from its header line alone, or null when it is not recognised (reading it
    /// in full then says why). Cheap: lets an import order files without holding them all in memory.
    /// </summary>
    public static RecordKind? KindOf(string path, ReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        if (CheckReadable(path, options.MaxBytes) is not null)
        {
            return null;
        }

        var layout = Layout.Recognise(path, options);
        if (layout.Problem is not null)
        {
            return null;
        }

        using var csv = CsvReader.FromFile(path, CsvOptions(layout.Separator));
        csv.ReadHeader();
        return HeaderMap.Resolve(layout.Headers(csv.Headers).Names).Map?.Schema.Kind;
    }

    internal static CsvReaderOptions CsvOptions(char separator) => new()
    {
        HasHeader = true,
        Separator = separator,
        TrackLineNumbers = true,
        FieldCountMismatch = CsvFieldCountHandling.Allow,
        MalformedData = CsvMalformedDataHandling.Throw,
    };

    private static ParsedFile Unreadable(string path, string sha, long line, string column, string reason) =>
        new() { Path = path, Sha256 = sha, IsUnreadable = true, Problems = [new RowProblem(path, line, column, reason)] };

    private static string? CheckReadable(string path, long maxBytes)
    {
        var length = new FileInfo(path).Length;
        if (length > maxBytes)
        {
            return $"the file is {length / 1048576.0:0.#} MB, over the {maxBytes / 1048576.0:0.#} MB limit for one import "
                + "(a file is stored whole, in one transaction); split it into smaller files, or raise the limit with --max-file-mb";
        }

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

        if (Array.IndexOf(head, (byte)0, 0, read) >= 0)
        {
            return "this is not a text file (it holds NUL bytes); export the records as UTF-8 CSV";
        }

        try
        {
            new UTF8Encoding(false, throwOnInvalidBytes: true).GetCharCount(head, 0, TrimPartialCharacter(head, read));
        }
        catch (DecoderFallbackException)
        {
            return "the file is not UTF-8 text (it may be a spreadsheet or another encoding); save it as CSV UTF-8";
        }

        return null;
    }

    // The 8 KB sample may end inside a multi-byte character; do not count that as invalid.
    private static int TrimPartialCharacter(byte[] bytes, int count)
    {
        var i = count;
        while (i > 0 && count - i < 3 && (bytes[i - 1] & 0xC0) == 0x80)
        {
            i--;
        }

        return i > 0 && bytes[i - 1] >= 0xC0 ? i - 1 : count;
    }

    private static string Describe(CsvFormatException e)
    {
        // CsvHelper's message starts with its own location; the problem already carries the line.
        var message = e.Message;
        var colon = message.IndexOf("): ", StringComparison.Ordinal);
        return colon >= 0 ? message[(colon + 3)..].TrimEnd('.') : message;
    }
}
