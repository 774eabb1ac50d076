using System.Text;

namespace TripTestLog.Ingest;

/// <summary>
/// The longest field and record a record file may hold (docs/record-formats.md, "Field lengths"). A record past the
/// record limit is refused before it is held in memory, so a huge field costs no more memory than the limit.
/// </summary>
internal static class FieldLimits
{
    /// <summary>The longest field, in characters: a note, a name, a location, a setting.</summary>
    public const int MaxFieldCharacters = 4000;

    /// <summary>The longest record, in bytes of UTF-8, that the reader buffers (CsvHelper's MaxRecordSize).</summary>
    public const int MaxRecordBytes = 1 << 20;

    /// <summary>The reason given for a field longer than <see cref="MaxFieldCharacters"/>.</summary>
    public static string TooLong(long length) =>
        $"the field is {length:N0} characters long; the longest a field may be is {MaxFieldCharacters:N0} (keep long notes in a document of their own)";

    /// <summary>The reason given for a field in a record too large to buffer.</summary>
    public static string TooLarge =>
        $"the field runs on past {MaxRecordBytes:N0} bytes; the longest a field may be is {MaxFieldCharacters:N0} characters "
        + "(keep long notes in a document of their own)";

    /// <summary>
    /// Which field of the record starting on physical line <paramref name="line"/> of <paramref name="path"/> first runs past
    /// <see cref="MaxFieldCharacters"/>: a second, streaming look at a record too large to buffer. Returns the field's
    /// index, or -1 when no field is that long (an unclosed quote).
    /// </summary>
    public static int FindLongField(string path, long line, char separator)
    {
        using var reader = new StreamReader(path, Encoding.UTF8, detectEncodingFromByteOrderMarks: true, bufferSize: 1 << 16);
        for (var n = 1L; n < line && reader.ReadLine() is not null; n++)
        {
        }

        var (field, length, quoted) = (0, 0, false);
        int c;
        for (var read = 0L; (c = reader.Read()) >= 0 && read < MaxRecordBytes * 2L; read++)
        {
            if (c == '"')
            {
                quoted = !quoted;
            }
            else if (!quoted && c == '\n')
            {
                break;
            }
            else if (!quoted && c == separator)
            {
                (field, length) = (field + 1, 0);
            }
            else if (++length > MaxFieldCharacters)
            {
                return field;
            }
        }

        return -1;
    }
}
