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

    /// <summary>Parses one row of a file of <paramref name="kind"/>: the record, or null when the row has problems.</summary>
    public static ReadRecord? Parse(RecordKind kind, RowFields fields) => kind switch
    {
        RecordKind.DeviceRegister => DeviceRowParser.Parse(fields) is { } d ? new RegisterRecord(d) : null,
        RecordKind.TripTests => TripRowParser.Parse(fields) is { } t ? new TripRecord(t) : null,
        RecordKind.ContactResistance => ContactRowParser.Parse(fields) is { } c ? new ContactRecord(c) : null,
        RecordKind.InsulationResistance => InsulationRowParser.Parse(fields) is { } i ? new InsulationRecord(i) : null,
        RecordKind.CurveTable => TableRowParser.Curve(fields) is { } r ? new CurveRowRecord(r) : null,
        RecordKind.AmbientTable => TableRowParser.Ambient(fields) is { } a ? new AmbientRowRecord(a) : null,
        _ => TableRowParser.Instrument(fields) is { } n ? new CalibrationRecord(n) : null,
    };

    /// <summary>Keeps a parsed record with its line.</summary>
    public void Add(ReadRecord record, long line)
    {
        switch (record)
        {
            case RegisterRecord d:
                _devices.Add(new(d.Device, line));
                break;
            case TripRecord t:
                _trips.Add(new(t.Trip, line));
                break;
            case ContactRecord c:
                _contacts.Add(new(c.Contact, line));
                break;
            case InsulationRecord i:
                _insulations.Add(new(i.Insulation, line));
                break;
            case CurveRowRecord r:
                _curveRows.Add(new(r.Row, line));
                break;
            case AmbientRowRecord r:
                _ambientRows.Add(new(r.Row, line));
                break;
            case CalibrationRecord r:
                _instruments.Add(new(r.Calibration, line));
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(record), record.GetType().Name, "a kind of record this file keeps no list for");
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
}
