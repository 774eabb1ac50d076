using TripTestLog.Domain.Devices;

namespace TripTestLog.Domain.Settings;

/// <summary>A miniature breaker has no settings but its curve; the rated current is the device's.</summary>
/// <param name="Curve">B, C or D.</param>
public sealed record Iec60898Settings(TripCurve Curve) : DeviceSettings
{
    /// <inheritdoc />
    public override string Summary => $"curve {Curve}";
}
