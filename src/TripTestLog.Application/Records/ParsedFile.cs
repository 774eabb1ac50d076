using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Records;

/// <summary>
/// Everything read from one record file: its kind, the records that parsed, and every problem found.
/// Exactly one of the record lists is filled, the one matching <see cref="Kind"/>.
/// </summary>
public sealed record ParsedFile
{
    /// <summary>How records and problems cite the file (relative to the folder given to import, or as given).</summary>
    public required string Path { get; init; }

    /// <summary>Where the file was read from; the same as <see cref="Path"/> unless the import named it relative to a folder.</summary>
    public string FullPath { get => field ?? Path; init; }

    /// <summary>SHA-256 of the file's bytes, lower-case hex.</summary>
    public required string Sha256 { get; init; }

    /// <summary>The kind recognised from the header; null when the header was not recognised.</summary>
    public RecordKind? Kind { get; init; }

    /// <summary>Data rows read (header and blank lines not counted).</summary>
    public long RowsRead { get; init; }

    /// <summary>Rows planned on a worksheet and left blank (tests not made): counted, not records.</summary>
    public long NotTested { get; init; }

    /// <summary>Every problem found, in file order.</summary>
    public IReadOnlyList<RowProblem> Problems { get; init; } = [];

    /// <summary>Device register rows.</summary>
    public IReadOnlyList<Located<Device>> Devices { get; init; } = [];

    /// <summary>Trip test rows.</summary>
    public IReadOnlyList<Located<TripMeasurement>> Trips { get; init; } = [];

    /// <summary>Contact resistance rows.</summary>
    public IReadOnlyList<Located<ContactMeasurement>> Contacts { get; init; } = [];

    /// <summary>Insulation resistance rows.</summary>
    public IReadOnlyList<Located<InsulationMeasurement>> Insulations { get; init; } = [];

    /// <summary>Curve table rows.</summary>
    public IReadOnlyList<Located<CurveTableRow>> CurveTableRows { get; init; } = [];

    /// <summary>Ambient table rows.</summary>
    public IReadOnlyList<Located<AmbientTableRow>> AmbientTableRows { get; init; } = [];

    /// <summary>Instrument register rows.</summary>
    public IReadOnlyList<Located<InstrumentCalibration>> Instruments { get; init; } = [];

    /// <summary>The number of rows that parsed into records.</summary>
    public int RecordCount => Devices.Count + Trips.Count + Contacts.Count + Insulations.Count + CurveTableRows.Count + AmbientTableRows.Count + Instruments.Count;

    /// <summary>The lines of the rows that parsed into records.</summary>
    public IEnumerable<long> RecordLines =>
        Devices.Select(r => r.Line).Concat(Trips.Select(r => r.Line)).Concat(Contacts.Select(r => r.Line)).Concat(Insulations.Select(r => r.Line))
            .Concat(CurveTableRows.Select(r => r.Line)).Concat(AmbientTableRows.Select(r => r.Line)).Concat(Instruments.Select(r => r.Line));

    /// <summary>
    /// True when the file as a whole could not be read (empty, not text, unknown header, malformed CSV, too large): then
    /// it is refused even where good rows would otherwise be accepted, because not every row could be accounted for.
    /// </summary>
    public bool IsUnreadable { get; init; }
}
