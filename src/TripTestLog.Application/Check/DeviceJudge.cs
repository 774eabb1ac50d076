using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Check;

/// <summary>Judges one device's trip tests with the tables and instruments of the store: shared by check and findings.</summary>
/// <param name="Curves">Curve tables by name.</param>
/// <param name="Ambients">Ambient tables by name.</param>
/// <param name="Instruments">The instrument register.</param>
/// <param name="RequireRegisteredInstruments">Whether an instrument missing from the register is a finding.</param>
/// <param name="AmbientNoteKelvin">How far from the reference ambient a thermal verdict carries a note.</param>
/// <param name="PointWindow">The lab's test-current tolerance within which a test is a test of a standard's point.</param>
/// <param name="Decision">The lab's decision rule and default accuracies (null: simple acceptance).</param>
internal sealed record DeviceJudge(IReadOnlyDictionary<string, CurveTable> Curves, IReadOnlyDictionary<string, AmbientTable> Ambients,
    InstrumentRegister Instruments, bool RequireRegisteredInstruments, double AmbientNoteKelvin = LabPolicy.AmbientNoteKelvin,
    double PointWindow = LabPolicy.PointWindow, DecisionPolicy? Decision = null)
{
    public static DeviceJudge For(ITripSource source, bool requireRegisteredInstruments, double ambientNoteKelvin = LabPolicy.AmbientNoteKelvin,
        double pointWindow = LabPolicy.PointWindow, DecisionPolicy? decision = null) =>
        new(source.CurveTables(), source.AmbientTables(), source.Instruments(), requireRegisteredInstruments, ambientNoteKelvin, pointWindow, decision);

    /// <summary>The device's tests judged in test-time order, each with the test before it to check its start claim.</summary>
    public IEnumerable<JudgedTrip> Judge(DeviceRecords device)
    {
        // One assessor per device: its envelope cache then holds that device's settings only.
        var assessor = new TripAssessor(Curves, Ambients, AmbientNoteKelvin, PointWindow, Decision, Instruments);
        TripMeasurement? previous = null;
        foreach (var trip in device.Trips)
        {
            var result = assessor.Assess(device.History, trip.Measurement, previous);
            var untraced = Instruments.Trace(trip.Measurement.Instrument, trip.Measurement.TestedAt.Date, RequireRegisteredInstruments);
            yield return new JudgedTrip(trip, result.Device, result.Envelope, result.Assessment, TripFindings.Of(trip, result.Assessment, untraced));
            previous = trip.Measurement;
        }
    }
}
