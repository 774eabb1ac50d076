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

    /// <summary>Reads <paramref name="path"/> whole; dates after <paramref name="today"/> are refused as future dates.</summary>
    /// <exception cref="IOException">When the file cannot be opened at all.</exception>
    public static ParsedFile Read(string path, DateOnly today, ReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        using var file = CsvRecordFile.Open(path, today, options);
        return file.ReadAll();
    }

    /// <summary>
    /// The kind of <paramref name="path"/> from its header line alone, or null when it is not recognised (reading it
    /// in full then says why). Cheap: lets an import order files without holding them all in memory.
    /// </summary>
    public static RecordKind? KindOf(string path, ReadOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        if (new FileInfo(path).Length > options.MaxBytes || CheckReadable(path) is not null)
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
        MaxRecordSize = FieldLimits.MaxRecordBytes,
    };

    private static string? CheckReadable(string path)
    {
        var head = new byte[8192];
        int read;
        using (var stream = File.OpenRead(path))
        {
            read = stream.ReadAtLeast(head, head.Length, throwOnEndOfStream: false);
        }

        return CsvRecordFile.CheckText(head, read);
    }
}
