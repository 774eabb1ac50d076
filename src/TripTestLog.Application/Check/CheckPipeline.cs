using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Check;

/// <summary>
/// Judges every stored trip test, device by device, with the register entry in force on its date, and yields each
/// judgement as it is made: memory holds one device's tests at a time, however large the fleet.
/// </summary>
public static class CheckPipeline
{
    /// <summary>
    /// The judged tests of every device (or of <paramref name="only"/>), in asset-tag and test-time order;
    /// <paramref name="requireRegisteredInstruments"/> makes an instrument missing from the register a finding.
    /// </summary>
    public static IEnumerable<JudgedTrip> Run(ITripSource source, AssetTag? only = null, bool requireRegisteredInstruments = false,
        CancellationToken cancel = default)
    {
        ArgumentNullException.ThrowIfNull(source);
        var curves = source.CurveTables();
        var ambients = source.AmbientTables();
        var instruments = source.Instruments();
        foreach (var device in source.Devices(only))
        {
            cancel.ThrowIfCancellationRequested();

            // One assessor per device: its envelope cache then holds that device's settings only.
            var assessor = new TripAssessor(curves, ambients);
            TripMeasurement? previous = null;
            foreach (var trip in device.Trips)
            {
                var result = assessor.Assess(device.History, trip.Measurement, previous);
                var untraced = instruments.Trace(trip.Measurement.Instrument, trip.Measurement.TestedAt.Date, requireRegisteredInstruments);
                yield return new JudgedTrip(trip, result.Device, result.Envelope, result.Assessment, TripFindings.Of(trip, result.Assessment, untraced));
                previous = trip.Measurement;
            }
        }
    }
}
