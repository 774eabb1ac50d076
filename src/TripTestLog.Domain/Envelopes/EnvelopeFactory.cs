using TripTestLog.Domain.Devices;

namespace TripTestLog.Domain.Envelopes;

/// <summary>Chooses the envelope a device's trip tests are judged against, from its family and ratings.</summary>
public static class EnvelopeFactory
{
    /// <summary>The envelope for <paramref name="device"/>.</summary>
    public static ITripEnvelope For(Device device) => device.Family switch
    {
        DeviceFamily.Iec60898 => new Iec60898Envelope(device.Curve, device.RatedCurrent),
        _ => throw new ArgumentOutOfRangeException(nameof(device), device.Family, "no envelope for this device family"),
    };
}
