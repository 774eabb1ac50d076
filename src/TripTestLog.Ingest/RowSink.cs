using TripTestLog.Domain.Records;
using TripTestLog.Domain.Devices;
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
    };

    private static void Keep<T>(List<Located<T>> list, T? record, long line)
        where T : class
    {
        if (record is not null)
        {
            list.Add(new Located<T>(record, line));
        }
    }
}
