using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Settings;

/// <summary>
/// Defaults where a standard leaves the figure to the maker or the lab. Each is a lab policy of this tool, stated here
/// with where it comes from; a device entry can override every one of them.
/// </summary>
public static class LabPolicy
{
    /// <summary>
    /// Time tolerance on tr and tsd of electronic trip units: ±20 %, at least ±20 ms. Common practice: makers of
    /// electronic trip units commonly state 10 % to 20 % (from memory); the wider figure is the default.
    /// </summary>
    public static TimeTolerance ElectronicTimeTolerance => TimeTolerance.Of(0.20, Seconds.Of(0.02));

    /// <summary>
    /// Latest clearing time once an instantaneous or magnetic release must act: 50 ms. Makers commonly state 10 ms to
    /// 50 ms for the instantaneous release of industrial breakers (from memory); IEC 60947-2 gives no figure.
    /// </summary>
    public static Seconds InstantaneousMax => Seconds.Of(0.05);

    /// <summary>
    /// Operate-time tolerance of an IDMT relay: ±5 %, at least ±40 ms. IEC 60255-151 has makers declare the accuracy as
    /// a percentage with a minimum time; 5 % and 30 ms to 40 ms are common declarations (from memory).
    /// </summary>
    public static TimeTolerance RelayTimeTolerance => TimeTolerance.Of(0.05, Seconds.Of(0.04));

    /// <summary>Pickup (start) tolerance of an IDMT relay: ±5 %, a common declared start accuracy under IEC 60255-151 (from memory).</summary>
    public const double RelayPickupTolerance = 0.05;

    /// <summary>The multiple of Ir at which the long-time delay tr is stated when the entry does not say: 6 (common maker practice).</summary>
    public const double TrReferenceMultiple = 6.0;
}
