using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Settings;

/// <summary>The settings of a thermal-magnetic release of an IEC 60947-2 breaker.</summary>
/// <param name="Ir">Thermal current setting.</param>
/// <param name="Im">Magnetic (instantaneous) setting.</param>
/// <param name="InstantaneousMax">Latest clearing time once the magnetic release must act (lab policy).</param>
public sealed record ThermalMagneticSettings(Amperes Ir, Amperes Im, Seconds InstantaneousMax) : DeviceSettings
{
    /// <inheritdoc />
    public override string Summary => $"Ir {Ir}, Im {Im}";
}
