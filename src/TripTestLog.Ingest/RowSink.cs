using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Ingest.Rows;

namespace TripTestLog.Ingest;

/// <summary>Sends each row to the parser of the file's kind and keeps what parsed, with its line.</summary>
internal sealed class RowSink(RecordKind kind)
{
    private readonly List<Located<Device>> _devices = [];
    private readonly List<Located<TripMeasurement>> _trips = [];
    private readonly List<Located<ContactMeasurement>> _contacts = [];
    private readonly List<Located<InsulationMeasurement>> _insulations = [];
    private readonly List<Located<CurveTableRow>> _curveRows = [];
    private readonly List<Located<AmbientTableRow>> _ambientRows = [];
    private readonly List<Located<InstrumentCalibration>> _instruments = [];

    public void Add(RowFields fields)
    {
        switch (kind)
        {
            case RecordKind.DeviceRegister:
                Keep(_devices, DeviceRowParser.Parse(fields), fields.Line);
                break;
            case RecordKind.TripTests:
                Keep(_trips, TripRowParser.Parse(fields), fields.Line);
                break;
            case RecordKind.ContactResistance:
                Keep(_contacts, ContactRowParser.Parse(fields), fields.Line);
                break;
            case RecordKind.InsulationResistance:
                Keep(_insulations, InsulationRowParser.Parse(fields), fields.Line);
                break;
            case RecordKind.CurveTable:
                Keep(_curveRows, TableRowParser.Curve(fields), fields.Line);
                break;
            case RecordKind.AmbientTable:
                Keep(_ambientRows, TableRowParser.Ambient(fields), fields.Line);
                break;
            case RecordKind.InstrumentRegister:
                Keep(_instruments, TableRowParser.Instrument(fields), fields.Line);
                break;
        }
    }

    public ParsedFile ToParsedFile(string path, string sha, long rows, IReadOnlyList<RowProblem> problems) => new()
    {
        Path = path,
        Sha256 = sha,
        Kind = kind,
        RowsRead = rows,
        Problems = problems,
        Devices = _devices,
        Trips = _trips,
        Contacts = _contacts,
        Insulations = _insulations,
        CurveTableRows = _curveRows,
        AmbientTableRows = _ambientRows,
        Instruments = _instruments,
    };

    /// <summary>Problems that only show across rows: the shape of each curve or ambient table.</summary>
    public IEnumerable<RowProblem> TableProblems(string path)
    {
        foreach (var group in _curveRows.GroupBy(r => r.Record.Table, StringComparer.Ordinal))
        {
            var rows = group.ToList();
            var points = rows.Select(r => r.Record.Point).ToList();
            if (rows.Count < 2)
            {
                yield return new RowProblem(path, rows[0].Line, "table", $"curve table {group.Key} has one row; it needs at least two");
            }

            for (var i = 0; i < points.Count; i++)
            {
                if (CurveTable.Problem(points, i) is { } why)
                {
                    yield return new RowProblem(path, rows[i].Line, "", $"curve table {group.Key}: {why}");
                }
            }
        }

        foreach (var group in _ambientRows.GroupBy(r => r.Record.Table, StringComparer.Ordinal))
        {
            var rows = group.ToList();
            if (rows.Count < 2)
            {
                yield return new RowProblem(path, rows[0].Line, "table", $"ambient table {group.Key} has one row; it needs at least two");
            }

            for (var i = 1; i < rows.Count; i++)
            {
                if (rows[i].Record.Point.Ambient.Value <= rows[i - 1].Record.Point.Ambient.Value)
                {
                    yield return new RowProblem(path, rows[i].Line, "ambient_c", $"ambient table {group.Key}: temperatures must rise from row to row");
                }
            }
        }
    }

    private static void Keep<T>(List<Located<T>> list, T? record, long line)
        where T : class
    {
        if (record is not null)
        {
            list.Add(new Located<T>(record, line));
        }
    }
}
