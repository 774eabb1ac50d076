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

    /// <summary>
    /// The multiple of the relay setting from which the dependent-time stage must operate, before the start accuracy:
    /// 1.1. IEC 60255-151 starts the dependent characteristic at about 1.1 x the setting (from memory), and many relays
    /// of both curve families start there rather than at the setting.
    /// </summary>
    public const double RelayOperateThreshold = 1.1;

    /// <summary>
    /// How far, in kelvin, the test ambient may lie from the reference ambient before it moves the thermal points' limits
    /// (<see cref="AmbientShiftPerKelvin"/>): 5 K. A lab policy: a miniature breaker's thermal release shifts by roughly 0.5 % to 1 % of
    /// current per kelvin (from memory), so within 5 K the shift stays within a few per cent, the order of a test set's
    /// current accuracy.
    /// </summary>
    public const double AmbientCheckKelvin = 5.0;

    /// <summary>
    /// The largest shift of a thermal release's current thresholds per kelvin of ambient, used to test whether a verdict
    /// could be the ambient's doing when the device has no derating table: 1 % per K (the upper end of 0.5 % to 1 %, from memory).
    /// </summary>
    public const double AmbientShiftPerKelvin = 0.01;

    /// <summary>
    /// How far, in kelvin, the ambient must lie from the reference before a verdict that survived the shift check still
    /// carries a note: 15 K, so tests in an ordinary 15 °C to 45 °C room against a 30 °C reference pass unmarked. Lab policy.
    /// </summary>
    public const double AmbientNoteKelvin = 15.0;

    /// <summary>
    /// The shortest rest after a test that carried current for <see cref="HeatingTestSeconds"/> or more before the next
    /// test on the same device counts as a cold start: 30 minutes. A lab policy, not a figure from a standard.
    /// </summary>
    public static TimeSpan ColdRest => TimeSpan.FromMinutes(30);

    /// <summary>A test that carried current this long or longer warms a thermal release; shorter (magnetic) shots do not: 1 s. Lab policy.</summary>
    public const double HeatingTestSeconds = 1.0;

    /// <summary>
    /// The longest gap between the end of a completed no-trip hold (1.13 In or 1.05 Ir) and the start of a test marked
    /// warm for it to count as "immediately after": 10 minutes. A lab policy, not a figure from a standard.
    /// </summary>
    public static TimeSpan WarmGap => TimeSpan.FromMinutes(10);

    /// <summary>
    /// The longest break time of an RCBO's residual-current release at its rated residual current: 0.3 s (IEC 61009-1,
    /// general type, from memory). A one-pole trip this fast may be the residual-current release's.
    /// </summary>
    public static Seconds ResidualBreakTime => Seconds.Of(0.3);

    /// <summary>
    /// The test-current tolerance within which a test is a test of a standard's point: ±3 % of the point's current. A
    /// lab policy of this tool, about a test set's current accuracy; no standard figure is used (the general test
    /// tolerances of IEC 60947-1 were not to hand to check).
    /// </summary>
    public const double PointWindow = 0.03;

    /// <summary>
    /// Below 2 x Is IEC 60255-151 declares no operate-time accuracy, yet the relay must operate from its start
    /// threshold: a hold longer than this many times the curve time at the multiple less its start accuracy (M / (1 + p)),
    /// with the time tolerance, is too late. 2, a lab policy with no source.
    /// </summary>
    public const double RelayStartBoundFactor = 2.0;

    /// <summary>The multiple of Ir at which the long-time delay tr is stated when the entry does not say: 6 (common maker practice).</summary>
    public const double TrReferenceMultiple = 6.0;

    /// <summary>
    /// The accuracy assumed for a test instrument the register states none for: time ±(0.5 % + 10 ms), current ±2 %, contact
    /// resistance ±(1 % + 1 uOhm), insulation resistance ±5 %, coverage factor k = 2. A lab policy: figures of the order
    /// test sets and meters commonly declare (from memory); k = 2 gives about 95 % coverage (GUM, JCGM 100:2008, 6.3.3).
    /// </summary>
    public static Instruments.InstrumentAccuracy DefaultAccuracy { get; } =
        Instruments.InstrumentAccuracy.Of(timePercent: 0.5, timeSeconds: 0.01, currentPercent: 2, currentAmperes: 0, resistancePercent: 1,
            resistanceMicroOhms: 1, insulationPercent: 5, coverageFactor: 2);
}
