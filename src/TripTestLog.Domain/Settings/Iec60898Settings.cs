using TripTestLog.Domain.Devices;

namespace TripTestLog.Domain.Settings;

/// <summary>
/// A miniature breaker (IEC 60898-1, or IEC 60898-2 for d.c.) or an RCBO (IEC 61009-1) has no settings but its curve
/// and its supply; the rated current is the device's.
/// </summary>
/// <param name="Curve">B, C or D (B or C on d.c.).</param>
public sealed record Iec60898Settings(TripCurve Curve) : DeviceSettings
{
    /// <summary>The supply the breaker is judged for; a.c. unless the register says d.c.</summary>
    public Supply Supply { get; init; } = Supply.Ac;

    /// <inheritdoc />
    public override string Summary => Supply == Supply.Dc ? $"curve {Curve}, d.c." : $"curve {Curve}";
}
