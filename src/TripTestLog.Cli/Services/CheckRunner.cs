using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Services;

/// <summary>A judged trip test with the register entry and envelope it was judged by, and where it came from.</summary>
/// <param name="Trip">The stored test.</param>
/// <param name="Device">The register entry in force on the test date.</param>
/// <param name="Envelope">The envelope it was judged against.</param>
/// <param name="Assessment">The verdict.</param>
/// <param name="InstrumentFinding">Why the test's instrument was not traceable on the test date, or null.</param>
internal sealed record CheckedTrip(StoredTrip Trip, Device Device, ITripEnvelope Envelope, TripAssessment Assessment, string? InstrumentFinding);

/// <summary>Judges every stored trip test with the settings in force on its date.</summary>
internal static class CheckRunner
{
    /// <summary>Every stored trip test judged; <paramref name="requireRegisteredInstruments"/> makes an unregistered instrument a finding.</summary>
    public static IReadOnlyList<CheckedTrip> Run(RecordStore store, AssetTag? only, bool requireRegisteredInstruments = false) =>
        Run(store, store.Histories(), only, requireRegisteredInstruments);

    /// <summary>As <see cref="Run(RecordStore, AssetTag?, bool)"/>, with the register histories already read.</summary>
    public static IReadOnlyList<CheckedTrip> Run(RecordStore store, IReadOnlyDictionary<string, DeviceHistory> histories, AssetTag? only, bool requireRegisteredInstruments)
    {
        var assessor = new TripAssessor(store.CurveTables(), store.AmbientTables());
        var instruments = store.Instruments();
        var results = new List<CheckedTrip>();
        Domain.Measurements.TripMeasurement? previous = null;

        // Trips come in device and date order, so the test before each one, which checks its start claim, is the last one seen.
        foreach (var trip in store.Trips(only))
        {
            var result = assessor.Assess(histories[trip.Tag.Value], trip.Measurement, previous);
            var finding = instruments.Check(trip.Measurement.Instrument, trip.Measurement.TestedAt.Date, requireRegisteredInstruments);
            results.Add(new CheckedTrip(trip, result.Device, result.Envelope, result.Assessment, finding));
            previous = trip.Measurement;
        }

        return results;
    }
}
