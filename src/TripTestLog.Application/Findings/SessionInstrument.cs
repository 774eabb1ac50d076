using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>
/// The instrument of one resistance test session (contact or insulation), judged as the trip tests' are: a session with an
/// instrument out of calibration on the day (or unregistered, where the lab requires registered instruments) raises one
/// finding; a later as-found session with a traceable instrument closes it.
/// </summary>
internal static class SessionInstrument
{
    /// <summary>Raises or closes the session's instrument finding.</summary>
    /// <param name="kind">The kind of test: contact or insulation.</param>
    /// <param name="tag">The device tested.</param>
    /// <param name="at">When the session was tested.</param>
    /// <param name="readings">The session's readings: each one's instrument and the records it rests on.</param>
    /// <param name="ledger">The device's findings.</param>
    /// <param name="policy">The lab policy (whether instruments must be registered).</param>
    /// <param name="instruments">The instrument register.</param>
    public static void Judge(TestKind kind, AssetTag tag, TestedAt at, IReadOnlyList<(string Instrument, IEnumerable<RecordSource> Sources)> readings,
        FindingLedger ledger, FindingPolicy policy, InstrumentRegister instruments)
    {
        var subject = kind == TestKind.Contact ? "instrument|contact" : "instrument|insulation";
        var untraced = readings.Select(r => (r.Instrument, u: instruments.Trace(r.Instrument, at.Date, policy.RequireRegisteredInstruments)))
            .FirstOrDefault(x => x.u is not null);
        if (untraced.u is null)
        {
            ledger.Clear(subject, at, new Settler.TraceableInstrument(kind));
            return;
        }

        ledger.Raise(subject, new Finding(untraced.u.Registered ? FindingKind.CalibrationLapsed : FindingKind.InstrumentUnregistered,
            Severity.Investigate, tag, at, new InstrumentFacts.SessionUntraced(kind, at.Date, untraced.u),
            [.. readings.SelectMany(r => r.Sources)])
        {
            Instrument = untraced.Instrument,
        });
    }
}
