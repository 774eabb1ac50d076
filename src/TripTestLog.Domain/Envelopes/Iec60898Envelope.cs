using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The trip-time band of a miniature breaker to IEC 60898-1 (IEC 60898-2 on d.c., IEC 61009-1 for an RCBO), built from
/// Table 7. Trip times fall as current rises, so each row is carried in one direction only:
/// <list type="bullet">
/// <item>Guaranteed minimums (a trip before them fails): row a's "no trip at t ≤ 1 h (2 h)" at and below 1.13 In; row
/// d's "no trip at t ≤ 0.1 s" at and below the lower instantaneous limit; and, below 2.55 In, t &gt; 1 s × (2.55 In / I)²,
/// because a thermal release needs at least row c's I²t at a lower current. Above the lower instantaneous limit the
/// magnetic release may act at once.</item>
/// <item>Guaranteed maximums (a trip after them fails): row b's "t &lt; 1 h (2 h)" from warm at and above 1.45 In; row c's
/// "t &lt; 60 s (120 s)" from cold at and above 2.55 In; row e's "t &lt; 0.1 s" at and above the upper instantaneous
/// limit; and, for one pole of a multipole breaker from cold, the conventional time from the single-pole point up.</item>
/// <item>Typical edges (advisories only): log-log lines through a and c, c and d (minimum); through b and c, then I²t =
/// constant from c to e (maximum). They are how makers draw the curve, not requirements.</item>
/// </list>
/// An ambient correction factor moves the thermal points a, b, c and the single-pole point (reference ambient 30 °C,
/// IEC 60898-1 8.6.1 / 9.10.1) and leaves the instantaneous points d and e where they are.
/// </summary>
public sealed class Iec60898Envelope : ITripEnvelope
{
    /// <summary>The reference ambient of IEC 60898-1 time-current tests: 30 °C (clause 9.10.1, from memory of the clause number).</summary>
    public static readonly Celsius ReferenceAmbient = Celsius.Of(30);

    private readonly Iec60898Table _t;
    private readonly IReadOnlyList<NormativePoint> _points;
    private readonly NormativePoint _a;
    private readonly NormativePoint _b;
    private readonly NormativePoint _c;
    private readonly NormativePoint _d;
    private readonly NormativePoint _e;
    private readonly NormativePoint? _singlePole;

    // Every edge whose words do not depend on the current, built once: At() runs for every test judged.
    private readonly BandEdge _aHold;
    private readonly BandEdge _aHoldCarried;
    private readonly BandEdge _cHold;
    private readonly BandEdge _dHold;
    private readonly BandEdge _dHoldCarried;
    private readonly BandEdge _bTrip;
    private readonly BandEdge _bTripCarried;
    private readonly BandEdge _cTrip;
    private readonly BandEdge _cTripCarried;
    private readonly BandEdge _eTrip;
    private readonly BandEdge _eTripCarried;
    private readonly BandEdge? _spTrip;
    private readonly BandEdge? _spTripCarried;
    private readonly BandEdge _derived;
    private readonly BandEdge _typicalAc;
    private readonly BandEdge _typicalCd;
    private readonly BandEdge _typicalBc;
    private readonly BandEdge _typicalI2t;

    /// <summary>
    /// Creates the envelope for a curve and rated current, with an optional ambient factor on the thermal points (0.5 to
    /// 1.5), the number of protected poles (1 to 4), the supply, and whether the breaker is an RCBO (IEC 61009-1).
    /// </summary>
    public Iec60898Envelope(TripCurve curve, Amperes ratedCurrent, double thermalFactor = 1.0, int poles = 1, Supply supply = Supply.Ac, bool rcbo = false)
    {
        Guard.InRange(thermalFactor, 0.5, 1.5, nameof(thermalFactor), "(factor)");
        Guard.InRange(poles, 1, 4, nameof(poles), "poles");
        Standard = rcbo ? "IEC 61009-1" : supply == Supply.Dc ? "IEC 60898-2" : "IEC 60898-1";
        var name = rcbo ? "IEC 61009-1 (rows of IEC 60898-1 Table 7)" : supply == Supply.Dc ? "IEC 60898-2 d.c. (rows of IEC 60898-1 Table 7)" : "IEC 60898-1 Table 7";
        _t = Iec60898Table.For(curve, ratedCurrent, thermalFactor, poles, supply, name);
        _points = _t.Points();
        _a = Point("a");
        _b = Point("b");
        _c = Point("c");
        _d = Point("d");
        _e = Point("e");
        _singlePole = _points.FirstOrDefault(p => p.Label == "1-pole");
        (_aHold, _aHoldCarried) = (_a.HoldEdge(carried: false), _a.HoldEdge(carried: true));
        (_dHold, _dHoldCarried) = (_d.HoldEdge(carried: false), _d.HoldEdge(carried: true));
        _cHold = _c.HoldEdge(carried: false);
        (_bTrip, _bTripCarried) = (_b.TripEdge(carried: false), _b.TripEdge(carried: true));
        (_cTrip, _cTripCarried) = (_c.TripEdge(carried: false), _c.TripEdge(carried: true));
        (_eTrip, _eTripCarried) = (_e.TripEdge(carried: false), _e.TripEdge(carried: true));
        (_spTrip, _spTripCarried) = (_singlePole?.TripEdge(carried: false), _singlePole?.TripEdge(carried: true));

        // A thermal release needs at least row c's I²t at a lower current, so row c's "1 s < t" implies this.
        _derived = new BandEdge(Seconds.Zero, EdgeSource.Derived, $"I²t of {_c.Requirement} at a lower current: t > 1 s x (2.55 In / I)²", StartCondition.Cold)
        {
            Strict = true, Loading = PoleLoading.AllPoles, PointLabel = "c",
        };
        _typicalAc = Typical($"log-log line between {_t.Name} a and c", StartCondition.Cold);
        _typicalCd = Typical($"log-log line between {_t.Name} c and d", StartCondition.Cold);
        _typicalBc = Typical($"log-log line between {_t.Name} b and c", StartCondition.Warm);
        _typicalI2t = Typical($"I²t = constant from {_t.Name} c", StartCondition.Cold) with { Source = EdgeSource.Extrapolated };
    }

    /// <inheritdoc />
    public string Standard { get; }

    /// <inheritdoc />
    public string ReferenceName => "In";

    /// <inheritdoc />
    public Amperes Reference => _t.Rated;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => _points;

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => current.Value < _t.D;

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var i = Snap(current.Value);
        return TripBand.Of(current, m, Minimums(i), Maximums(i), "IEC 60898-1 sets no requirement here");
    }

    private NormativePoint Point(string label) => _points.First(p => p.Label == label);

    // Float division can land a hair off a table point (e.g. 40.8 A / 16 A); within a part in 10^9 it is the point.
    private double Snap(double i)
    {
        var t = _t;
        return Near(i, t.A) ?? Near(i, t.B) ?? Near(i, t.C) ?? Near(i, t.D) ?? Near(i, t.E) ?? Near(i, t.SinglePole ?? 0) ?? i;
    }

    private static double? Near(double i, double p) => Math.Abs(i - p) <= 1e-9 * p ? p : null;

    // At most five edges on a side at any current (a list is made for every band read, so it is made to size).
    private const int MostEdges = 5;

    private List<BandEdge> Minimums(double i)
    {
        var t = _t;
        var edges = new List<BandEdge>(MostEdges);

        // Above d the magnetic release may act at once, whatever the thermal rows say; a large ambient factor can even
        // move row c above d, so this comes first.
        if (i > t.D)
        {
            return edges;
        }

        edges.Add(i < t.D ? _dHoldCarried : _dHold);
        if (i <= t.A)
        {
            edges.Add(i < t.A ? _aHoldCarried : _aHold);
        }

        if (i == t.C)
        {
            edges.Add(_cHold);
        }
        else if (i < t.C)
        {
            edges.Add(_derived with { Limit = Seconds.Of(LogLog.ConstantI2T(i, t.C, Iec60898Table.ThermalMinimumSeconds)) });
        }

        if (i > t.A && i < t.C)
        {
            edges.Add(_typicalAc with { Limit = Seconds.Of(LogLog.Interpolate(i, t.A, t.ConventionalTime.Value, t.C, Iec60898Table.ThermalMinimumSeconds)) });
        }
        else if (i > t.C && i < t.D)
        {
            edges.Add(_typicalCd with { Limit = Seconds.Of(LogLog.Interpolate(i, t.C, Iec60898Table.ThermalMinimumSeconds, t.D, Iec60898Table.InstantaneousSeconds)) });
        }

        return edges;
    }

    private List<BandEdge> Maximums(double i)
    {
        var t = _t;
        var edges = new List<BandEdge>(MostEdges);
        if (i >= t.B)
        {
            edges.Add(i > t.B ? _bTripCarried : _bTrip);
        }

        if (i >= t.C)
        {
            edges.Add(i > t.C ? _cTripCarried : _cTrip);
        }

        if (i >= t.E)
        {
            edges.Add(i > t.E ? _eTripCarried : _eTrip);
        }

        if (_spTrip is { } sp && _spTripCarried is { } spCarried && t.SinglePole is { } spCurrent && i >= spCurrent)
        {
            edges.Add(i > spCurrent ? spCarried : sp);
        }

        if (i > t.B && i < t.C)
        {
            edges.Add(_typicalBc with { Limit = Seconds.Of(LogLog.Interpolate(i, t.B, t.ConventionalTime.Value, t.C, t.ThermalMaximum.Value)) });
        }
        else if (i > t.C && i < t.E)
        {
            edges.Add(_typicalI2t with { Limit = Seconds.Of(LogLog.ConstantI2T(i, t.C, t.ThermalMaximum.Value)) });
        }

        return edges;
    }

    private static BandEdge Typical(string why, StartCondition start) =>
        new(Seconds.Zero, EdgeSource.Interpolated, why, start) { Strength = EdgeStrength.Typical, Loading = PoleLoading.AllPoles };
}
