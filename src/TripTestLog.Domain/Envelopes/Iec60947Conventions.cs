using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The fixed figures of IEC 60947-2 that every industrial breaker envelope uses. Source: IEC 60947-2, clause 8.3.3
/// (tripping limits and characteristics) and its table of conventional times, quoted from memory of the 2016 edition:
/// conventional non-tripping current 1.05 x setting and conventional tripping current 1.30 x setting within the
/// conventional time of 1 h (In &lt;= 63 A) or 2 h (In &gt; 63 A); short-time and instantaneous releases do not operate
/// at 80 % of their setting and operate at 120 % (±20 %). Check the edition your lab works to.
/// </summary>
internal static class Iec60947Conventions
{
    public const double NonTrippingMultiple = 1.05;

    public const double TrippingMultiple = 1.30;

    public const double PickupTolerance = 0.20;

    public static Seconds ConventionalTime(Amperes rated) => Seconds.FromHours(rated.Value <= 63.0 ? 1.0 : 2.0);

    public static string Hours(Seconds conventional) => $"{conventional.Value / 3600.0:0} h";

    /// <summary>Whether a release set at <paramref name="setting"/> may operate at <paramref name="current"/>: above 80 % of it.</summary>
    public static bool MayOperate(double current, double setting) => current > (1 - PickupTolerance) * setting;

    /// <summary>Whether a release set at <paramref name="setting"/> must operate at <paramref name="current"/>: at 120 % of it and above.</summary>
    public static bool MustOperate(double current, double setting) => current >= (1 + PickupTolerance) * setting;

    /// <summary>
    /// The two conventional points as multiples of Ir, scaled by the ambient factor on the thermal release. The 1.30 Ir
    /// point follows the 1.05 Ir test (from memory, by analogy with IEC 60898-1 row b). <paramref name="anyStart"/> when
    /// the release times from current, not from heat (an electronic unit without thermal memory); <paramref name="loading"/>
    /// the poles the points assume loaded (null when the release measures each pole alike).
    /// </summary>
    public static IReadOnlyList<NormativePoint> Points(Seconds conventional, double thermalFactor, bool anyStart, PoleLoading? loading)
    {
        var h = Hours(conventional);
        return
        [
            new("1.05Ir", CurrentMultiple.Of(NonTrippingMultiple * thermalFactor), StartCondition.Cold, conventional, null,
                $"IEC 60947-2 8.3.3: 1.05 Ir from cold, no trip within {h}") { HoldStrict = true, AnyStart = anyStart, Loading = loading, HighestUltimate = TrippingMultiple * thermalFactor },
            new("1.30Ir", CurrentMultiple.Of(TrippingMultiple * thermalFactor), StartCondition.Warm, null, conventional,
                $"IEC 60947-2 8.3.3: 1.30 Ir straight after the 1.05 Ir test, trip within {h}") { AnyStart = anyStart, Loading = loading, HighestUltimate = TrippingMultiple * thermalFactor },
        ];
    }
}
