using System.Globalization;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Settings;

/// <summary>The settings of an electronic trip unit of an IEC 60947-2 breaker.</summary>
/// <param name="Ir">Long-time pickup (current setting).</param>
/// <param name="Tr">Long-time delay at <paramref name="TrReferenceMultiple"/> x Ir.</param>
/// <param name="TrReferenceMultiple">The multiple of Ir at which tr is stated (makers commonly use 6).</param>
/// <param name="Isd">Short-time pickup, when the unit has one.</param>
/// <param name="Tsd">Short-time delay, with <paramref name="Isd"/>.</param>
/// <param name="TsdI2t">Whether the short-time delay is inverse (I²t on) below <see cref="ElectronicTripSettings.TsdI2tReferenceMultiple"/> x Ir.</param>
/// <param name="Ii">Instantaneous pickup, when the unit has one.</param>
/// <param name="TimeTolerance">Tolerance on tr and tsd (lab policy; a device may override it).</param>
/// <param name="InstantaneousMax">Latest clearing time once the instantaneous release must act (lab policy).</param>
public sealed record ElectronicTripSettings(
    Amperes Ir,
    Seconds Tr,
    double TrReferenceMultiple,
    Amperes? Isd,
    Seconds? Tsd,
    bool TsdI2t,
    Amperes? Ii,
    TimeTolerance TimeTolerance,
    Seconds InstantaneousMax) : DeviceSettings
{
    /// <summary>
    /// With I²t on, the short-time delay follows t = tsd (10 Ir / I)² below 10 Ir and is definite above: a common maker
    /// convention, from memory, not a requirement of IEC 60947-2.
    /// </summary>
    public const double TsdI2tReferenceMultiple = 10.0;

    /// <summary>
    /// Whether the unit keeps a thermal image between overloads (the register says so). Without it the unit computes its
    /// time from the current alone, so a warm start trips no sooner than a cold one.
    /// </summary>
    public bool ThermalMemory { get; init; }

    /// <inheritdoc />
    public override string Summary
    {
        get
        {
            var parts = new List<string> { $"Ir {Ir}", $"tr {Tr} at {TrReferenceMultiple.ToString("0.#", CultureInfo.InvariantCulture)} Ir" };
            if (Isd is { } isd && Tsd is { } tsd)
            {
                parts.Add($"Isd {isd}, tsd {tsd}{(TsdI2t ? " I²t" : "")}");
            }

            if (Ii is { } ii)
            {
                parts.Add($"Ii {ii}");
            }

            if (ThermalMemory)
            {
                parts.Add("thermal memory");
            }

            return string.Join(", ", parts);
        }
    }
}
