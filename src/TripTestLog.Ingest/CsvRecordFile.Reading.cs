using System.Text;
using CsvHelper;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Ingest.Columns;
using TripTestLog.Ingest.Rows;

namespace TripTestLog.Ingest;

/// <summary>The row loop, and the checks made on the first block of the file.</summary>
internal sealed partial class CsvRecordFile
{
    private bool _keepRaw;

    private string? CurrentRaw => _keepRaw && _csv is not null ? Encoding.UTF8.GetString(_csv.RawRecord).TrimEnd('\r', '\n') : null;

    /// <summary>The header line as written, for a rejects file.</summary>
    internal string HeaderText => _headerLine.TrimStart('\uFEFF');

    internal char Separator => _layout?.Separator ?? ',';

    public IRejectsSink Rejects()
    {
        _keepRaw = true;
        return new CsvRejectsSink(this);
    }

    private IEnumerable<ReadRow> ReadRows(CsvReader csv, HeaderMap map, MappedHeaders headers, Layout layout)
    {
        var kind = map.Schema.Kind;
        var dateFormats = _options.Profile?.DateFormats ?? [];
        while (true)
        {
            bool more;
            try
            {
                more = csv.Read();
            }
            catch (CsvFormatException e) when (TooLarge(e, layout.Separator, csv) is { } problem)
            {
                _unreadable = true;
                _fileProblems.Add(problem);
                yield break;
            }
            catch (CsvFormatException e)
            {
                // Past a malformed record the rest of the file cannot be read, so its rows cannot be accounted for.
                _unreadable = true;
                _fileProblems.Add(new RowProblem(_name, e.LineNumber, "", $"the CSV is malformed here ({Describe(e)}); reading stopped, so the file is refused"));
                yield break;
            }

            if (!more)
            {
                yield break;
            }

            _rows++;
            if (csv.FieldCount != csv.Headers.Count)
            {
                yield return new ReadRow(csv.LineNumber, null, [FieldCountProblem(csv, layout)], CurrentRaw);
                continue;
            }

            if (LongField(csv) is { } longField)
            {
                yield return new ReadRow(csv.LineNumber, null, [longField], CurrentRaw);
                continue;
            }

            var fields = new RowFields(map, headers.Values(csv), _name, csv.LineNumber, _today, layout.DecimalComma, dateFormats);
            if (IsNotTested(kind, fields))
            {
                yield return new ReadRow(csv.LineNumber, null, [], CurrentRaw) { NotTested = true };
                continue;
            }

            var record = RowSink.Parse(kind, fields);
            if (record is not null && kind is RecordKind.CurveTable or RecordKind.AmbientTable)
            {
                _tables.Add(record, csv.LineNumber);
            }

            yield return new ReadRow(csv.LineNumber, fields.Problems.Count == 0 ? record : null, fields.Problems, CurrentRaw);
        }
    }

    // Too many fields in a comma file, two neighbours of them whole numbers: most likely numbers written with decimal
    // commas ("6,85" read as 6 and 85). Said as its own cause, so a file of them gets one message.
    private RowProblem FieldCountProblem(CsvHelper.CsvReader csv, Layout layout)
    {
        if (layout.Separator == ',' && csv.FieldCount > csv.Headers.Count)
        {
            for (var i = 0; i + 1 < csv.FieldCount; i++)
            {
                if (IsDigits(csv.GetString(i)) && IsDigits(csv.GetString(i + 1)))
                {
                    return new RowProblem(_name, csv.LineNumber, "", ReadProblems.DecimalCommaFields(csv.FieldCount, csv.Headers.Count,
                        $"{csv.GetString(i)!.Trim()},{csv.GetString(i + 1)!.Trim()}")) { Cause = ReadProblems.DecimalCommaCause };
                }
            }
        }

        return new RowProblem(_name, csv.LineNumber, "",
            $"this row has {csv.FieldCount} fields but the header has {csv.Headers.Count}; check for a missing or extra "
            + $"'{layout.Separator}', or quote fields that hold one") { Cause = "field-count" };
    }

    private static bool IsDigits(string? text) => text?.Trim() is { Length: > 0 } t && t.TrimStart('-').Length > 0 && t.TrimStart('-').All(char.IsAsciiDigit);

    // A field past the documented limit, named by its column: the record fitted in the reader's buffer.
    private RowProblem? LongField(CsvReader csv)
    {
        for (var i = 0; i < csv.FieldCount; i++)
        {
            // A UTF-8 field holds no more characters than bytes: the raw length rules out nearly every field at no cost.
            if (csv.GetRawSpan(i).Length > FieldLimits.MaxFieldCharacters && csv.GetString(i).Length is var length
                && length > FieldLimits.MaxFieldCharacters)
            {
                return new RowProblem(_name, csv.LineNumber, i < csv.Headers.Count ? csv.Headers[i] : $"{i + 1}", FieldLimits.TooLong(length));
            }
        }

        return null;
    }

    // A record too large to buffer: a second streaming look finds the field that runs past the limit, so the problem
    // names its column; reading stops there, and the file is refused.
    private RowProblem? TooLarge(CsvFormatException e, char separator, CsvReader csv)
    {
        if (!e.Message.Contains("MaxRecordSize", StringComparison.Ordinal) && !e.Message.Contains("too large", StringComparison.OrdinalIgnoreCase))
        {
            return null;
        }

        var field = FieldLimits.FindLongField(_path, e.LineNumber, separator);
        return field < 0
            ? new RowProblem(_name, e.LineNumber, "", $"this record runs past {FieldLimits.MaxRecordBytes:N0} bytes (a quote that is never closed?); "
                + "reading stopped, so the file is refused")
            : new RowProblem(_name, e.LineNumber, field < csv.Headers.Count ? csv.Headers[field] : $"{field + 1}",
                FieldLimits.TooLarge + "; reading stopped, so the file is refused");
    }

    // A planned worksheet row with every result blank: the test was not made.
    private static bool IsNotTested(RecordKind kind, RowFields fields) =>
        fields.Text(RecordSchema.PlanColumn).Length > 0 && RecordSchema.ResultColumns(kind) is { Count: > 0 } results
        && results.All(c => fields.Text(c).Length == 0);

    private static (byte[] Head, int Count) ReadHead(Stream stream)
    {
        // The first block, extended to the end of the header line when that is longer (up to 1 MB).
        var head = new byte[HeadBytes];
        var count = stream.ReadAtLeast(head, head.Length, throwOnEndOfStream: false);
        while (count == head.Length && Array.IndexOf(head, (byte)'\n', 0, count) < 0 && head.Length < (1 << 20))
        {
            Array.Resize(ref head, head.Length * 2);
            count += stream.ReadAtLeast(head.AsSpan(count), head.Length - count, throwOnEndOfStream: false);
        }

        return (head, count);
    }

    /// <summary>Why the first block of a file shows it is no UTF-8 text record file, or null.</summary>
    internal static string? CheckText(byte[] head, int read)
    {
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

    private static string HeaderLine(byte[] head, int count)
    {
        var end = Array.IndexOf(head, (byte)'\n', 0, count);
        var text = Encoding.UTF8.GetString(head, 0, end < 0 ? TrimPartialCharacter(head, count) : end);
        return text.TrimEnd('\r').TrimStart('\uFEFF');
    }

    // The sample may end inside a multi-byte character; do not count that as invalid.
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
