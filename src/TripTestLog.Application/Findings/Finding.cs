using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Something a person should act on or look into, as a typed value: what kind, how urgent, the requirement or policy it
/// rests on, and the records it rests on. Prose is made from it at the edge.
/// </summary>
/// <param name="Kind">What the finding is about.</param>
/// <param name="Severity">How urgently it asks for action.</param>
/// <param name="Asset">The device.</param>
/// <param name="TestedAt">The latest test it rests on.</param>
/// <param name="Basis">The standard's requirement or the lab policy it comes from.</param>
/// <param name="Message">Plain words a technician can act on.</param>
/// <param name="RestsOn">The stored records it rests on: file and line.</param>
public sealed record Finding(
    FindingKind Kind,
    Severity Severity,
    AssetTag Asset,
    TestedAt TestedAt,
    string Basis,
    string Message,
    IReadOnlyList<RecordSource> RestsOn);

/// <summary>Where a stored record came from.</summary>
/// <param name="File">The file it was imported from.</param>
/// <param name="Line">Its line in that file.</param>
public sealed record RecordSource(string File, long Line);
