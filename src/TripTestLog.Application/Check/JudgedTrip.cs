using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Check;

/// <summary>A judged trip test with the register entry and envelope it was judged by, where it came from, and its findings.</summary>
/// <param name="Trip">The stored test.</param>
/// <param name="Device">The register entry in force on the test date.</param>
/// <param name="Envelope">The envelope it was judged against.</param>
/// <param name="Assessment">The verdict.</param>
/// <param name="Findings">What about this test needs attention: a verdict out of band, an untraceable instrument.</param>
public sealed record JudgedTrip(StoredTrip Trip, Device Device, ITripEnvelope Envelope, TripAssessment Assessment, IReadOnlyList<Finding> Findings)
{
    /// <summary>Whether the test needs attention: too early, too late, or made with an untraceable instrument.</summary>
    public bool IsFinding => Findings.Count > 0;

    /// <summary>Why the test's instrument was not traceable on the test date, as the instrument register gives it, or null.</summary>
    public string? InstrumentFinding =>
        Findings.Select(f => f.Facts).OfType<InstrumentFacts.Untraced>().FirstOrDefault()?.Trace.Message;
}
