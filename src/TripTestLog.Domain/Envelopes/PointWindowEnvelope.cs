using System.Globalization;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// A family's envelope with its standard points judged at the lab's test-current tolerance: a test within
/// <see cref="Window"/> of a point's current is a test of that point, and the point's limits hold there too, moved by
/// what the current offset can explain (<see cref="OffsetBound"/>) and only in the test's favour. An ambient away from
/// the release's reference moves the thermal points' limits the same way, as the current shift it can cause. Both
/// <c>check</c> and <c>envelope</c> read bands through this, so they agree.
/// </summary>
public sealed class PointWindowEnvelope : ITripEnvelope
{
    private const int MostMovedKept = 8;
    private readonly ITripEnvelope _inner;
    private readonly AmbientShift _ambient;

    // A band is read for every test judged (and either side of its current when a decision rule needs the slope), a
    // million times in a large check: the ambient's note and each requirement it extends are written once per envelope.
    private readonly string _ambientNote;
    private (string From, string To)[] _movedRequirements = [];

    private PointWindowEnvelope(ITripEnvelope inner, double window, AmbientShift ambient)
    {
        _inner = inner;
        Window = Guard.InRange(window, 0, 0.1, nameof(window), "(fraction)");
        _ambient = ambient;
        _ambientNote = ambient.IsNone ? "" : $", moved for the ambient ({ambient.Words})";
    }

    /// <summary>The relative test-current tolerance within which a test is a test of a point.</summary>
    public double Window { get; }

    /// <summary>The ambient's shift in words, or empty when the ambient moves nothing.</summary>
    public string AmbientWords => _ambient.Words;

    /// <summary>The ambient's shift: a proof at a non-reference ambient must clear the limit moved against the test.</summary>
    public AmbientShift Ambient => _ambient;

    /// <summary>The family's envelope read through this one.</summary>
    public ITripEnvelope Inner => _inner;

    /// <inheritdoc />
    public string Standard => _inner.Standard;

    /// <inheritdoc />
    public string ReferenceName => _inner.ReferenceName;

    /// <inheritdoc />
    public Amperes Reference => _inner.Reference;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => _inner.Points;

    /// <summary>
    /// <paramref name="envelope"/> with its points judged at <paramref name="window"/> (default the lab policy's) and,
    /// when given, the ambient's current shift on its thermal points. An envelope already wrapped is re-wrapped around
    /// its inner one.
    /// </summary>
    public static PointWindowEnvelope Of(ITripEnvelope envelope, double window = LabPolicy.PointWindow, AmbientShift? ambient = null)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        var inner = envelope is PointWindowEnvelope w ? w._inner : envelope;
        return new PointWindowEnvelope(inner, window, ambient ?? AmbientShift.None);
    }

    /// <summary>This envelope with its window widened by <paramref name="extra"/> (a fraction), at most to 10 %, the ambient kept.</summary>
    public PointWindowEnvelope Widened(double extra) => new(_inner, Math.Min(0.1, Window + Math.Max(0, extra)), _ambient);

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => _inner.IsThermal(current);

    /// <inheritdoc />
    public TripBand At(Amperes current) => At(current, worded: true);

    /// <summary>
    /// The band at <paramref name="current"/> for its limits: a point's limit moved for the current's offset is named by
    /// its point's requirement alone, without the words on how far it moved. The judge reads the band a step either side
    /// of every test's current this way, for the slope of a limit, where only the limits and which requirement each is
    /// are used.
    /// </summary>
    internal TripBand LimitsAt(Amperes current) => At(current, worded: false);

    private TripBand At(Amperes current, bool worded)
    {
        var band = _inner.At(current);
        var m = (current / Reference).Value;
        var minimums = Moved(band.Minimums, m, minimum: true);
        var maximums = Moved(band.Maximums, m, minimum: false);
        var points = Points;
        for (var i = 0; i < points.Count; i++)
        {
            var p = points[i];
            if (!p.Within(m, Window))
            {
                continue;
            }

            var u = p.HighestUltimate;
            var mp = p.Multiple.Value;
            if (p.MustTripWithin is { } t && m < mp && OffsetBound.Stretch(m * Lo(p), mp, u) is var s && !double.IsInfinity(s))
            {
                maximums.Add(p.TripEdge(carried: false) with { Limit = Seconds.Of(t.Value * s), Requirement = worded ? Offset(p, m, s) : p.Requirement });
            }

            if (p.MustHoldFor is { } h && m > mp && OffsetBound.Shrink(m * Hi(p), mp, u) is var k && k > 0)
            {
                minimums.Add(p.HoldEdge(carried: false) with { Limit = Seconds.Of(h.Value * k), Requirement = worded ? Offset(p, m, k) : p.Requirement });
            }
        }

        return band.HasRequirement || minimums.Count + maximums.Count > band.Minimums.Count + band.Maximums.Count
            ? TripBand.Of(current, band.Multiple, minimums, maximums, band.NoRequirement ?? "no requirement here")
            : band;
    }

    // The ambient moves only thermal points: a magnetic threshold does not follow the room.
    private double Lo(NormativePoint p) => p.HighestUltimate is null ? 1.0 : _ambient.Lower;

    private double Hi(NormativePoint p) => p.HighestUltimate is null ? 1.0 : _ambient.Upper;

    // The edges with the ambient's moves, room left for the points' own (at most one of each kind a point).
    private List<BandEdge> Moved(IReadOnlyList<BandEdge> edges, double m, bool minimum)
    {
        var moved = new List<BandEdge>(edges.Count + 2);
        for (var i = 0; i < edges.Count; i++)
        {
            if (Moved(edges[i], m, minimum) is { } kept)
            {
                moved.Add(kept);
            }
        }

        return moved;
    }

    // A point's own edge carried here keeps its limit unless the ambient moves the current it acts at past the point.
    private BandEdge? Moved(BandEdge e, double m, bool minimum)
    {
        if (_ambient.IsNone || e.Strength != EdgeStrength.Guaranteed || e.PointLabel is not { } label
            || Labelled(label) is not { HighestUltimate: { } u } p || e.Limit is not { } limit)
        {
            return e;
        }

        var mp = p.Multiple.Value;
        if (e.Source == EdgeSource.Derived)
        {
            var hi = m * _ambient.Upper;
            var floor = hi < mp ? limit.Value / (_ambient.Upper * _ambient.Upper) : (p.MustHoldFor?.Value ?? 0) * OffsetBound.Shrink(hi, mp, u);
            return floor > 0 ? e with { Limit = Seconds.Of(floor), Requirement = MovedRequirement(e.Requirement) } : null;
        }

        if (minimum && p.MustHoldFor is { } h)
        {
            var k = OffsetBound.Shrink(m * _ambient.Upper, mp, u);
            return k > 0 ? e with { Limit = Seconds.Of(Math.Min(limit.Value, h.Value * k)), Requirement = k < 1 ? MovedRequirement(e.Requirement) : e.Requirement } : null;
        }

        if (!minimum && p.MustTripWithin is { } t)
        {
            var s = OffsetBound.Stretch(m * _ambient.Lower, mp, u);
            return double.IsInfinity(s) ? null : e with { Limit = Seconds.Of(Math.Max(limit.Value, t.Value * s)), Requirement = s > 1 ? MovedRequirement(e.Requirement) : e.Requirement };
        }

        return e;
    }

    // An envelope is made for nearly every ambient a fleet's tests were run at, and moves only a few requirements: a
    // short list replaced whole (a race between two readers can lose an entry, never change one) is all it needs.
    private string MovedRequirement(string requirement)
    {
        var moved = Volatile.Read(ref _movedRequirements);
        foreach (var (from, to) in moved)
        {
            if (string.Equals(from, requirement, StringComparison.Ordinal))
            {
                return to;
            }
        }

        var made = requirement + _ambientNote;
        if (moved.Length < MostMovedKept)
        {
            Volatile.Write(ref _movedRequirements, [.. moved, (requirement, made)]);
        }

        return made;
    }

    private NormativePoint? Labelled(string label)
    {
        var points = Points;
        for (var i = 0; i < points.Count; i++)
        {
            if (points[i].Label == label)
            {
                return points[i];
            }
        }

        return null;
    }

    private string Offset(NormativePoint p, double m, double factor)
    {
        var pct = (m / p.Multiple.Value - 1) * 100;
        var f = factor.ToString("0.###", CultureInfo.InvariantCulture);
        var amb = _ambient.IsNone || p.HighestUltimate is null ? "" : $" and the ambient ({_ambient.Words})";
        return $"{p.Requirement}; tested {Math.Abs(pct).ToString("0.0", CultureInfo.InvariantCulture)} % {(pct < 0 ? "below" : "above")} its current, "
            + $"limit x{f} for the offset{amb} (first-order thermal bound)";
    }
}
