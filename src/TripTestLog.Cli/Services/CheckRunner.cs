using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Services;

/// <summary>A judged trip test with its device and where it came from.</summary>
/// <param name="Trip">The stored test.</param>
/// <param name="Envelope">The envelope it was judged against.</param>
/// <param name="Assessment">The verdict.</param>
internal sealed record CheckedTrip(StoredTrip Trip, ITripEnvelope Envelope, TripAssessment Assessment);

/// <summary>Judges every stored trip test against its device's envelope.</summary>
internal static class CheckRunner
{
    public static IReadOnlyList<CheckedTrip> Run(RecordStore store, AssetTag? only)
    {
        var envelopes = new Dictionary<Device, ITripEnvelope>();
        var results = new List<CheckedTrip>();
        foreach (var trip in store.Trips(only))
        {
            if (!envelopes.TryGetValue(trip.Device, out var envelope))
            {
                envelope = EnvelopeFactory.For(trip.Device);
                envelopes[trip.Device] = envelope;
            }

            results.Add(new CheckedTrip(trip, envelope, TripJudge.Assess(envelope, trip.Measurement)));
        }

        return results;
    }
}
