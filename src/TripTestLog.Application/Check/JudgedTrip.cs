using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Check;

/// <summary>A judged trip test with the register entry and envelope it was judged by, and where it came from.</summary>
/// <param name="Trip">The stored test.</param>
/// <param name="Device">The register entry in force on the test date.</param>
/// <param name="Envelope">The envelope it was judged against.</param>
/// <param name="Assessment">The verdict.</param>
/// <param name="InstrumentFinding">Why the test's instrument was not traceable on the test date, or null.</param>
public sealed record JudgedTrip(StoredTrip Trip, Device Device, ITripEnvelope Envelope, TripAssessment Assessment, string? InstrumentFinding)
{
    /// <summary>Whether the test needs attention: too early, too late, or made with an untraceable instrument.</summary>
    public bool IsFinding => Assessment.IsFailure || InstrumentFinding is not null;
}
