using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of an IEC 60947-2 breaker with an electronic trip unit, from its settings:
/// <list type="bullet">
/// <item>Long time: conventional points 1.05 Ir (no trip within the conventional time) and 1.30 Ir (trip within it);
/// above 1.30 Ir the band is t = tr (k / M)² (M = I / Ir, k = the tr reference multiple) within the time tolerance,
/// never past the conventional time; between 1.05 and 1.30 Ir the minimum is the log-log line joining the two.</item>
/// <item>Short time (optional): may act from 0.8 Isd, must act from 1.2 Isd (±20 %, IEC 60947-2); delay tsd
/// (definite), or with I²t on tsd (10 Ir / I)² below 10 Ir; within the time tolerance.</item>
/// <item>Instantaneous (optional): may act at once from 0.8 Ii, must act by the lab's instantaneous limit from 1.2 Ii.</item>
/// </list>
/// The functions are composed by <see cref="EdgeCandidates"/>.
/// </summary>
public sealed class ElectronicTripEnvelope : ITripEnvelope
{
    private readonly ElectronicTripSettings _s;
    private readonly Seconds _conventional;
    private readonly double _thermalFactor;
    private readonly IReadOnlyList<NormativePoint> _points;

    /// <summary>Creates the envelope; <paramref name="thermalFactor"/> scales the long-time pickup for ambient (0.5 to 1.5).</summary>
    public ElectronicTripEnvelope(Amperes rated, ElectronicTripSettings settings, double thermalFactor = 1.0)
    {
        ArgumentNullException.ThrowIfNull(settings);
        _s = settings;
        _thermalFactor = Guard.InRange(thermalFactor, 0.5, 1.5, nameof(thermalFactor), "(factor)");
        _conventional = Iec60947Conventions.ConventionalTime(rated);
        _points = Iec60947Conventions.Points(_conventional, thermalFactor);
    }

    /// <inheritdoc />
    public string Standard => "IEC 60947-2";

    /// <inheritdoc />
    public string ReferenceName => "Ir";

    /// <inheritdoc />
    public Amperes Reference => _s.Ir;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => _points;

    private double LongTimeIr => _s.Ir.Value * _thermalFactor;

    /// <inheritdoc />
    public bool IsThermal(Amperes current) =>
        (_s.Isd is not { } isd || current.Value < (1 - Iec60947Conventions.PickupTolerance) * isd.Value)
        && (_s.Ii is not { } ii || current.Value < (1 - Iec60947Conventions.PickupTolerance) * ii.Value);

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var i = current.Value;
        var lt = i / LongTimeIr;
        if (lt < Iec60947Conventions.NonTrippingMultiple * (1 - 1e-9))
        {
            var none = "IEC 60947-2 sets no trip band below 1.05 Ir";
            return new TripBand(current, m, BandEdge.NoMinimum(none), BandEdge.NoMaximum(none), none + "; test at 1.05 Ir or above");
        }

        var edges = new EdgeCandidates();
        LongTime(edges, lt);
        ShortTime(edges, i);
        Instantaneous(edges, i);
        return new TripBand(current, m, edges.Minimum(BandEdge.NoMinimum("no function acts")), edges.Maximum("no function must act below 1.30 Ir"), null);
    }

    private void LongTime(EdgeCandidates edges, double lt)
    {
        const double a = Iec60947Conventions.NonTrippingMultiple;
        const double b = Iec60947Conventions.TrippingMultiple;
        var conv = _conventional.Value;
        var minAtB = Math.Min(_s.TimeTolerance.Earliest(Nominal(b)).Value, conv);
        if (Math.Abs(lt - a) <= 1e-9 * a)
        {
            edges.CouldAct(new BandEdge(_conventional, EdgeSource.NormativePoint, _points[0].Requirement, StartCondition.Cold));
        }
        else if (lt < b)
        {
            var s = LogLog.Interpolate(lt, a, conv, b, minAtB);
            edges.CouldAct(new BandEdge(Seconds.Of(s), EdgeSource.Interpolated, "log-log line from 1.05 Ir (IEC 60947-2) to the tr band at 1.30 Ir", StartCondition.Cold));
        }
        else
        {
            var nominal = Nominal(lt);
            var why = $"long time: tr {_s.Tr} at {_s.TrReferenceMultiple:0.#} Ir, I²t, {_s.TimeTolerance}";
            edges.CouldAct(new BandEdge(Seconds.Of(Math.Min(_s.TimeTolerance.Earliest(nominal).Value, conv)), EdgeSource.Setting, why, StartCondition.Cold));
            var latest = _s.TimeTolerance.Latest(nominal).Value;
            edges.MustAct(latest < conv
                ? new BandEdge(Seconds.Of(latest), EdgeSource.Setting, why, StartCondition.Cold)
                : new BandEdge(_conventional, EdgeSource.NormativePoint, _points[1].Requirement, StartCondition.Warm));
        }
    }

    private void ShortTime(EdgeCandidates edges, double i)
    {
        if (_s.Isd is not { } isd || _s.Tsd is not { } tsd)
        {
            return;
        }

        var nominal = _s.TsdI2t ? tsd.Value * Math.Max(1, Math.Pow(ElectronicTripSettings.TsdI2tReferenceMultiple * _s.Ir.Value / i, 2)) : tsd.Value;
        var why = $"short time: Isd {isd} ±20 % (IEC 60947-2), tsd {tsd}{(_s.TsdI2t ? " I²t" : "")}, {_s.TimeTolerance}";
        if (i >= (1 - Iec60947Conventions.PickupTolerance) * isd.Value)
        {
            edges.CouldAct(new BandEdge(_s.TimeTolerance.Earliest(nominal), EdgeSource.Setting, why, StartCondition.Cold));
        }

        if (i >= (1 + Iec60947Conventions.PickupTolerance) * isd.Value)
        {
            edges.MustAct(new BandEdge(_s.TimeTolerance.Latest(nominal), EdgeSource.Setting, why, StartCondition.Cold));
        }
    }

    private void Instantaneous(EdgeCandidates edges, double i)
    {
        if (_s.Ii is not { } ii)
        {
            return;
        }

        var why = $"instantaneous: Ii {ii} ±20 % (IEC 60947-2), clearing within {_s.InstantaneousMax} (lab policy)";
        if (i >= (1 - Iec60947Conventions.PickupTolerance) * ii.Value)
        {
            edges.CouldAct(BandEdge.NoMinimum(why));
        }

        if (i >= (1 + Iec60947Conventions.PickupTolerance) * ii.Value)
        {
            edges.MustAct(new BandEdge(_s.InstantaneousMax, EdgeSource.Setting, why, StartCondition.Cold));
        }
    }

    // Long-time delay tr stated at k x Ir; inverse I²t: t = tr (k / M)².
    private double Nominal(double multiple) => LogLog.ConstantI2T(multiple, _s.TrReferenceMultiple, _s.Tr.Value);
}
