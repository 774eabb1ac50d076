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
    /// <param name="kind">The measurement in words and in the finding's subject: "contact" or "insulation".</param>
    /// <param name="tag">The device tested.</param>
    /// <param name="at">When the session was tested.</param>
    /// <param name="readings">The session's readings: each one's instrument and the records it rests on.</param>
    /// <param name="ledger">The device's findings.</param>
    /// <param name="policy">The lab policy (whether instruments must be registered).</param>
    /// <param name="instruments">The instrument register.</param>
    public static void Judge(string kind, AssetTag tag, TestedAt at, IReadOnlyList<(string Instrument, IEnumerable<RecordSource> Sources)> readings,
        FindingLedger ledger, FindingPolicy policy, InstrumentRegister instruments)
    {
        var subject = $"instrument|{kind}";
        var untraced = readings.Select(r => (r.Instrument, u: instruments.Trace(r.Instrument, at.Date, policy.RequireRegisteredInstruments)))
            .FirstOrDefault(x => x.u is not null);
        if (untraced.u is null)
        {
            ledger.Clear(subject, at, $"{kind} test with a traceable instrument");
            return;
        }

        ledger.Raise(subject, new Finding(untraced.u.Registered ? FindingKind.CalibrationLapsed : FindingKind.InstrumentUnregistered,
            Severity.Investigate, tag, at, "lab policy: every measurement is made with an instrument in calibration",
            $"{kind} resistance tests on {at.Date:yyyy-MM-dd}: {untraced.u.Message}; confirm the instrument's accuracy or repeat the tests",
            [.. readings.SelectMany(r => r.Sources)])
        {
            Instrument = untraced.Instrument,
        });
    }
}
