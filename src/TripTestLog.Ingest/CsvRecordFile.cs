using System.Text;
using CsvHelper;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Ingest.Columns;
using TripTestLog.Ingest.Rows;

namespace TripTestLog.Ingest;

/// <summary>
/// One record file read in a single pass: the bytes go once through a hash, the header is looked at from the first
/// block, and the rows stream through CsvHelper to their parsers. Never throws for bad content: a problem names the
/// file, line, column and what to fix.
/// </summary>
internal sealed partial class CsvRecordFile : IRecordFile
{
    private const int HeadBytes = 8192;

    private readonly string _path;
    private readonly string _name;
    private readonly DateOnly _today;
    private readonly ReadOptions _options;
    private readonly HashingStream? _hashing;
    private readonly CsvReader? _csv;
    private readonly HeaderMap? _map;
    private readonly MappedHeaders? _headers;
    private readonly Layout? _layout;
    private readonly string _headerLine = "";
    private readonly List<RowProblem> _fileProblems = [];
    private readonly RowSink _tables;
    private FileSummary? _summary;
    private bool _unreadable;
    private long _rows;

    private CsvRecordFile(string path, DateOnly today, ReadOptions options, string name)
    {
        _path = path;
        _name = name;
        _today = today;
        _options = options;
        _tables = new RowSink(RecordKind.CurveTable);
        if (new FileInfo(path).Length is var length && length > options.MaxBytes)
        {
            Refuse($"the file is {length / 1048576.0:0.#} MB, over the {options.MaxBytes / 1048576.0:0.#} MB limit set with --max-file-mb; "
                + "raise or drop the limit to import it");
            return;
        }

        _hashing = new HashingStream(new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan));
        var (head, count) = ReadHead(_hashing);
        if (CheckText(head, count) is { } problem)
        {
            Refuse(problem);
            return;
        }

        _headerLine = HeaderLine(head, count);
        _layout = Layout.FromHeader(_headerLine, options);
        if (_layout.Problem is { } layoutProblem)
        {
            Refuse(layoutProblem);
            return;
        }

        _csv = CsvReader.Create(new PrefixedStream(head, count, _hashing), RecordFileReader.CsvOptions(_layout.Separator), leaveOpen: true);
        _csv.ReadHeader();
        _headers = _layout.Headers(_csv.Headers);
        var (map, headerProblems) = HeaderMap.Resolve(_headers.Names);
        if (map is null)
        {
            _unreadable = true;
            _fileProblems.AddRange(headerProblems.Select(p => new RowProblem(_name, 1, p.Column, p.Reason)));
            return;
        }

        _map = map;
        Kind = map.Schema.Kind;
    }

    public string Path => _path;

    public string Name => _name;

    public RecordKind? Kind { get; }

    public FileSummary Summary => _summary ?? throw new InvalidOperationException("the summary is known once every row has been read");

    /// <summary>Opens <paramref name="path"/>, cited as <paramref name="name"/> (the path itself when not given); an I/O error opening it is the caller's to report.</summary>
    public static CsvRecordFile Open(string path, DateOnly today, ReadOptions options, string? name = null) => new(path, today, options, name ?? path);

    public IEnumerable<ReadRow> Rows()
    {
        if (_csv is not null && _map is not null && _headers is not null && _layout is not null)
        {
            foreach (var row in ReadRows(_csv, _map, _headers, _layout))
            {
                yield return row;
            }
        }

        Finish();
    }

    public ParsedFile ReadAll()
    {
        var sink = new RowSink(Kind ?? RecordKind.DeviceRegister);
        var problems = new List<RowProblem>();
        long notTested = 0;
        foreach (var row in Rows())
        {
            notTested += row.NotTested ? 1 : 0;
            if (row.Record is { } record)
            {
                sink.Add(record, row.Line);
            }

            problems.AddRange(row.Problems);
        }

        var summary = Summary;
        problems.AddRange(summary.Problems);
        return sink.ToParsedFile(_name, summary.Sha256, summary.RowsRead, problems) with
        {
            FullPath = _path,
            Kind = Kind,
            IsUnreadable = summary.IsUnreadable,
            NotTested = notTested,
        };
    }

    public void Dispose()
    {
        _csv?.Dispose();
        _hashing?.Dispose();
    }

    private void Refuse(string reason)
    {
        _unreadable = true;
        _fileProblems.Add(new RowProblem(_name, 1, "", reason));
    }

    private void Finish()
    {
        if (_summary is not null)
        {
            return;
        }

        if (_map is not null && _rows == 0 && _fileProblems.Count == 0)
        {
            Refuse($"the file has a {HeaderMap.Describe(_map.Schema.Kind)} header but no data rows");
        }

        _fileProblems.AddRange(_tables.TableProblems(_name));
        var sha = _hashing?.Finish() ?? "";
        _summary = new FileSummary(sha, _rows, _fileProblems, _unreadable);
    }
}
