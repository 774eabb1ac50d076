using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of an IEC 60947-2 breaker with an electronic trip unit, from its settings. Every edge is guaranteed:
/// <list type="bullet">
/// <item>Conventional points: no trip within the conventional time at and below 1.05 Ir; a trip within it at and above
/// 1.30 Ir.</item>
/// <item>Long time: above 1.05 Ir the unit may act, no sooner than t = tr (k / M)² less the time tolerance (M = I / Ir,
/// k = the tr reference multiple); from 1.30 Ir it must act, no later than that time plus the tolerance.</item>
/// <item>Short time (optional): no operation at or below 0.8 Isd, operation from 1.2 Isd (IEC 60947-2); delay tsd
/// (definite), or with I²t on tsd (10 Ir / I)² below 10 Ir; within the time tolerance.</item>
/// <item>Instantaneous (optional): no operation at or below 0.8 Ii; it may act at once above, and must act by the lab's
/// instantaneous limit from 1.2 Ii.</item>
/// </list>
/// The unit computes its time from the current, so without thermal memory every edge holds whatever the start; with
/// thermal memory a warm start trips sooner, and the minimums hold from cold only. It measures each pole, so loading one
/// pole changes nothing. The functions are composed by <see cref="EdgeCandidates"/>.
/// </summary>
public sealed class ElectronicTripEnvelope : ITripEnvelope
{
    private readonly ElectronicTripSettings _s;
    private readonly Seconds _conventional;
    private readonly double _thermalFactor;
    private readonly IReadOnlyList<NormativePoint> _points;
    private readonly bool _anyStart;

    /// <summary>Creates the envelope; <paramref name="thermalFactor"/> scales the long-time pickup for ambient (0.5 to 1.5).</summary>
    public ElectronicTripEnvelope(Amperes rated, ElectronicTripSettings settings, double thermalFactor = 1.0)
    {
        ArgumentNullException.ThrowIfNull(settings);
        _s = settings;
        _thermalFactor = Guard.InRange(thermalFactor, 0.5, 1.5, nameof(thermalFactor), "(factor)");
        _conventional = Iec60947Conventions.ConventionalTime(rated);
        _anyStart = !settings.ThermalMemory;
        _points = Iec60947Conventions.Points(_conventional, thermalFactor, _anyStart, loading: null);
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
        (_s.Isd is not { } isd || !Iec60947Conventions.MayOperate(current.Value, isd.Value))
        && (_s.Ii is not { } ii || !Iec60947Conventions.MayOperate(current.Value, ii.Value));

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var i = current.Value;
        var lt = i / LongTimeIr;
        var a = Iec60947Conventions.NonTrippingMultiple;
        var b = Iec60947Conventions.TrippingMultiple;
        var atA = Math.Abs(lt - a) <= 1e-9 * a;
        var atB = Math.Abs(lt - b) <= 1e-9 * b;
        var minimums = new List<BandEdge>();
        var maximums = new List<BandEdge>();

        if (lt <= a || atA)
        {
            minimums.Add(_points[0].HoldEdge(carried: !atA));
        }

        if (lt >= b || atB)
        {
            maximums.Add(_points[1].TripEdge(carried: !atB));
        }

        var functions = new EdgeCandidates();
        LongTime(functions, lt, mayAct: lt > a && !atA, mustAct: lt >= b || atB, warm: false);
        ShortTime(functions, i);
        Instantaneous(functions, i);
        if (functions.Minimum() is { } min)
        {
            // With thermal memory this composition assumes a cold long-time release, whichever function it picked.
            minimums.Add(_anyStart ? min : min with { Start = StartCondition.Cold, AnyStart = false });
        }

        if (functions.Maximum() is { } max)
        {
            maximums.Add(max);
        }

        // With thermal memory a warm long-time release may act at once, so a warm test is held to the other functions only.
        if (!_anyStart)
        {
            var warm = new EdgeCandidates();
            LongTime(warm, lt, mayAct: lt > a && !atA, mustAct: false, warm: true);
            ShortTime(warm, i);
            Instantaneous(warm, i);
            if (warm.Minimum() is { } warmMin)
            {
                minimums.Add(warmMin with { Start = StartCondition.Warm, AnyStart = false });
            }
        }

        return TripBand.Of(current, m, minimums, maximums, "IEC 60947-2 sets no requirement here");
    }

    private BandEdge Setting(double seconds, string why) =>
        new(Seconds.Of(seconds), EdgeSource.Setting, why, StartCondition.Cold) { AnyStart = _anyStart };

    private void LongTime(EdgeCandidates functions, double lt, bool mayAct, bool mustAct, bool warm)
    {
        var nominal = Nominal(lt);
        var why = $"long time: tr {_s.Tr} at {_s.TrReferenceMultiple:0.#} Ir, I²t, {_s.TimeTolerance}";
        if (mayAct && warm)
        {
            functions.CouldAct(BandEdge.NoMinimum($"{why}; with thermal memory a warm unit may act at once"));
        }
        else if (mayAct)
        {
            // Never later than the conventional time, or a long tr would push the minimum past the 1.30 Ir limit.
            functions.CouldAct(Setting(Math.Min(_s.TimeTolerance.Earliest(nominal).Value, _conventional.Value), why));
        }

        if (mustAct)
        {
            functions.MustAct(Setting(_s.TimeTolerance.Latest(nominal).Value, why));
        }
    }

    private void ShortTime(EdgeCandidates functions, double i)
    {
        if (_s.Isd is not { } isd || _s.Tsd is not { } tsd)
        {
            return;
        }

        var nominal = _s.TsdI2t ? tsd.Value * Math.Max(1, Math.Pow(ElectronicTripSettings.TsdI2tReferenceMultiple * _s.Ir.Value / i, 2)) : tsd.Value;
        var why = $"short time: Isd {isd}, no operation at 0.8 Isd, operation at 1.2 Isd (IEC 60947-2), tsd {tsd}{(_s.TsdI2t ? " I²t" : "")}, {_s.TimeTolerance}";
        if (Iec60947Conventions.MayOperate(i, isd.Value))
        {
            functions.CouldAct(Setting(_s.TimeTolerance.Earliest(nominal).Value, why) with { AnyStart = true });
        }

        if (Iec60947Conventions.MustOperate(i, isd.Value))
        {
            functions.MustAct(Setting(_s.TimeTolerance.Latest(nominal).Value, why) with { AnyStart = true });
        }
    }

    private void Instantaneous(EdgeCandidates functions, double i)
    {
        if (_s.Ii is not { } ii)
        {
            return;
        }

        var why = $"instantaneous: Ii {ii}, no operation at 0.8 Ii, operation at 1.2 Ii (IEC 60947-2), clearing within {_s.InstantaneousMax} (lab policy)";
        if (Iec60947Conventions.MayOperate(i, ii.Value))
        {
            functions.CouldAct(BandEdge.NoMinimum(why));
        }

        if (Iec60947Conventions.MustOperate(i, ii.Value))
        {
            functions.MustAct(new BandEdge(_s.InstantaneousMax, EdgeSource.Setting, why, StartCondition.Cold) { AnyStart = true });
        }
    }

    // Long-time delay tr stated at k x Ir; inverse I²t: t = tr (k / M)².
    private double Nominal(double multiple) => LogLog.ConstantI2T(multiple, _s.TrReferenceMultiple, _s.Tr.Value);
}
