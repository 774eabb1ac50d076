using System.Runtime.CompilerServices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// A test point a standard defines: a current multiple, a start condition and the time limits at it. Trip times fall
/// as current rises, so a no-trip limit also holds at every lower current and a trip-by limit at every higher one; the
/// envelopes carry each limit that way and no further.
/// </summary>
/// <param name="Label">Short name of the point within its standard, e.g. "a" for IEC 60898-1 Table 7 row a.</param>
/// <param name="Multiple">The test current as a multiple of the reference current.</param>
/// <param name="Start">The start condition the standard prescribes.</param>
/// <param name="MustHoldFor">The time the device must carry the current without tripping, if any.</param>
/// <param name="MustTripWithin">The time within which the device must trip, if any.</param>
/// <param name="Requirement">The requirement in plain words, with its source.</param>
public sealed record NormativePoint(
    string Label,
    CurrentMultiple Multiple,
    StartCondition Start,
    Seconds? MustHoldFor,
    Seconds? MustTripWithin,
    string Requirement)
{
    /// <summary>True when a trip at exactly <see cref="MustHoldFor"/> is too early ("no tripping at t ≤ T", "T &lt; t").</summary>
    public bool HoldStrict { get; init; }

    /// <summary>True when a trip at exactly <see cref="MustTripWithin"/> is too late ("tripping at t &lt; T").</summary>
    public bool TripStrict { get; init; }

    /// <summary>True when the requirement holds whatever the thermal start (e.g. a magnetic release).</summary>
    public bool AnyStart { get; init; }

    /// <summary>The poles the point assumes loaded; null when any.</summary>
    public PoleLoading? Loading { get; init; }

    /// <summary>
    /// For a thermal point, the highest ultimate tripping multiple a compliant release may have (the standard's
    /// conventional tripping current); null for a magnetic point, whose threshold may sit anywhere past it. Bounds how
    /// far the point's limits move for a test a little off its current (<see cref="OffsetBound"/>).
    /// </summary>
    public double? HighestUltimate { get; init; }

    /// <summary>True when the point only forbids a trip: a hold long enough at or above its current proves it.</summary>
    public bool IsNoTripPoint => MustHoldFor is not null && MustTripWithin is null;

    /// <summary>The point's no-trip limit as a minimum edge; <paramref name="carried"/> when used below the point's current.</summary>
    public BandEdge HoldEdge(bool carried) => EdgesOf(this).Hold(carried);

    /// <summary>The point's trip-by limit as a maximum edge; <paramref name="carried"/> when used above the point's current.</summary>
    public BandEdge TripEdge(bool carried) => EdgesOf(this).Trip(carried);

    // The judge asks every point for its edges at every test, a million times in a large check: each point's four edges
    // are made once and shared (an edge cannot change). They are kept beside the point, not in it, so a point's value
    // (and its equality) stays its fields alone.
    private static readonly ConditionalWeakTable<NormativePoint, Edges> EdgesKept = new();

    private static Edges EdgesOf(NormativePoint point) => EdgesKept.GetValue(point, static p => new Edges(p));

    private sealed class Edges(NormativePoint p)
    {
        private BandEdge? _hold, _holdCarried, _trip, _tripCarried;

        public BandEdge Hold(bool carried) => carried
            ? _holdCarried ??= HoldEdge(p, $"{p.Requirement}, carried to lower currents", carried: true)
            : _hold ??= HoldEdge(p, p.Requirement, carried: false);

        public BandEdge Trip(bool carried) => carried
            ? _tripCarried ??= TripEdge(p, $"{p.Requirement}, carried to higher currents", carried: true)
            : _trip ??= TripEdge(p, p.Requirement, carried: false);

        private static BandEdge HoldEdge(NormativePoint p, string requirement, bool carried) => new(p.MustHoldFor, EdgeSource.NormativePoint, requirement, p.Start)
        {
            Strict = p.HoldStrict, AnyStart = p.AnyStart, Loading = p.Loading, PointLabel = p.Label, Carried = carried,
        };

        private static BandEdge TripEdge(NormativePoint p, string requirement, bool carried) => new(p.MustTripWithin, EdgeSource.NormativePoint, requirement, p.Start)
        {
            Strict = p.TripStrict, AnyStart = p.AnyStart, Loading = p.Loading, PointLabel = p.Label, Carried = carried,
        };
    }

    /// <summary>Whether <paramref name="multiple"/> lies within <paramref name="window"/> (relative) of the point's current.</summary>
    public bool Within(double multiple, double window) => Math.Abs(multiple / Multiple.Value - 1.0) <= window + 1e-12;

    /// <summary>The point in words for a reason: e.g. "c (2.55 In from cold)".</summary>
    public string Brief(string referenceName) => $"{Label} ({Where(referenceName)})";

    /// <summary>Where the point is tested, e.g. "2.55 In from cold".</summary>
    public string Where(string referenceName) =>
        $"{Multiple.Value.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture)} {referenceName}{(AnyStart ? "" : Start == StartCondition.Cold ? " from cold" : " from warm")}";
}
