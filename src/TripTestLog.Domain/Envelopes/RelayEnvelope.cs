using System.Globalization;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of a breaker tripped by an inverse-time overcurrent relay. The IDMT stage operates at
/// t = TMS (k / (M^alpha - 1) + c) (IEC 60255-151 Table 1; IEEE C37.112 Table 1), M = I / Is, within the time
/// tolerance (a percentage with a floor, the IEC 60255-151 form).
/// <list type="bullet">
/// <item>Start: below Is (1 - p) it must not operate at all (p = the declared start accuracy). It must operate from
/// <see cref="LabPolicy.RelayOperateThreshold"/> x Is (1 + p): many relays start their dependent characteristic at about
/// 1.1 x setting, not at the setting (IEC 60255-151, from memory), so requiring operation at the setting plus its
/// tolerance would fail sound relays. In between it may operate, no sooner than the characteristic allows at Is (1 + p).</item>
/// <item>Within 2 to 20 x Is, the range over which IEC 60255-151 has accuracy declared (from memory), both edges are the
/// standard's characteristic and guaranteed. Outside it the formula gives typical edges only, and the range's ends are
/// carried in the direction physics gives them (operate time never rises with current): the minimum at 2 x Is holds
/// below, the maximum at 20 x Is holds above.</item>
/// <item>An optional definite-time high-set stage is composed with it (<see cref="EdgeCandidates"/>).</item>
/// <item>The breaker's opening time is added to the latest time only: timed at the main contacts a trip includes it,
/// but a breaker that opens faster than its nominal time must not make the relay look early.</item>
/// </list>
/// A relay times from current, not heat, and measures each phase: every edge holds whatever the start and the poles.
/// </summary>
public sealed class RelayEnvelope : ITripEnvelope
{
    /// <summary>The lower end of the characteristic's accuracy range, x Is (IEC 60255-151, from memory).</summary>
    public const double AccuracyFrom = 2.0;

    /// <summary>The upper end of the characteristic's accuracy range, x Is (IEC 60255-151, from memory).</summary>
    public const double AccuracyTo = 20.0;

    private readonly RelaySettings _s;
    private readonly IdmtConstants _k;

    /// <summary>Creates the envelope for the relay settings.</summary>
    public RelayEnvelope(RelaySettings settings)
    {
        ArgumentNullException.ThrowIfNull(settings);
        _s = settings;
        _k = IdmtConstants.For(settings.Curve);
    }

    /// <inheritdoc />
    public string Standard => _k.Source.StartsWith("IEEE", StringComparison.Ordinal) ? "IEEE C37.112" : "IEC 60255-151";

    /// <inheritdoc />
    public string ReferenceName => "Is";

    /// <inheritdoc />
    public Amperes Reference => _s.Pickup;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => [];

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => false;

    /// <summary>The multiple of Is from which the relay must operate: the operate threshold times (1 + start accuracy).</summary>
    public double MustOperateFrom => LabPolicy.RelayOperateThreshold * (1 + _s.PickupTolerance);

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = (current / Reference).Value;
        var p = _s.PickupTolerance;
        var why = $"{_k.Source}: {CurveCodes.Of(_s.Curve)}, TMS {_s.Tms.ToString("0.###", CultureInfo.InvariantCulture)}, start ±{p * 100:0.#} %, {_s.TimeTolerance}";
        var guaranteed = new EdgeCandidates();
        var typical = new EdgeCandidates();

        if (m >= 1 - p && Math.Max(m, 1 + p) > 1)
        {
            var earliest = Earliest(Math.Max(m, 1 + p));
            if (m < AccuracyFrom)
            {
                guaranteed.CouldAct(Edge(Earliest(AccuracyFrom), EdgeSource.Characteristic, $"{why}; the minimum at {AccuracyFrom:0} x Is, carried to lower currents") with { Carried = true });
                typical.CouldAct(Edge(earliest, EdgeSource.Extrapolated, $"{why} (formula below {AccuracyFrom:0} x Is)"));
            }
            else if (m <= AccuracyTo)
            {
                guaranteed.CouldAct(Edge(earliest, EdgeSource.Characteristic, why));
                typical.CouldAct(Edge(earliest, EdgeSource.Characteristic, why));
            }
            else
            {
                // Above 20 x Is a dependent-time stage follows its formula or turns definite-time (from memory, IEC
                // 60255-151), which is slower: the formula's earliest time is the soonest it can act, though it has no
                // declared accuracy to prove.
                guaranteed.CouldAct(Edge(earliest, EdgeSource.Characteristic, $"{why}; the formula above {AccuracyTo:0} x Is, the soonest the stage acts") with { Carried = true });
                typical.CouldAct(Edge(earliest, EdgeSource.Extrapolated, $"{why} (formula above {AccuracyTo:0} x Is)"));
            }
        }

        if (m >= MustOperateFrom)
        {
            var latest = Latest(m);
            if (m > AccuracyTo)
            {
                guaranteed.MustAct(Edge(Latest(AccuracyTo), EdgeSource.Characteristic, $"{why}; the maximum at {AccuracyTo:0} x Is, carried to higher currents") with { Carried = true });
                typical.MustAct(Edge(latest, EdgeSource.Extrapolated, $"{why} (formula above {AccuracyTo:0} x Is)"));
            }
            else if (m >= AccuracyFrom)
            {
                guaranteed.MustAct(Edge(latest, EdgeSource.Characteristic, why));
                typical.MustAct(Edge(latest, EdgeSource.Characteristic, why));
            }
            else
            {
                // The relay must operate here, though the standard bounds no time below 2 x Is: a hold past the lab's bound
                // is too late, and a trip within it shows the start.
                guaranteed.MustAct(Edge(StartBound(m), EdgeSource.Setting,
                    $"{why}; must operate from {MustOperateFrom:0.###} x Is, within {LabPolicy.RelayStartBoundFactor:0.#} x the curve time at M / (1 + p) with its tolerance (lab bound below {AccuracyFrom:0} x Is)"));
                typical.MustAct(Edge(latest, EdgeSource.Extrapolated, $"{why} (formula below {AccuracyFrom:0} x Is)"));
            }
        }

        if (_s.HighSet is { } hs && _s.HighSetDelay is { } delay)
        {
            var hsWhy = $"high-set {hs} ±{p * 100:0.#} %, delay {delay}, {_s.TimeTolerance}";
            foreach (var set in new[] { guaranteed, typical })
            {
                if (current.Value >= hs.Value * (1 - p))
                {
                    set.CouldAct(Edge(_s.TimeTolerance.Earliest(delay.Value), EdgeSource.Setting, hsWhy));
                }

                if (current.Value >= hs.Value * (1 + p))
                {
                    set.MustAct(Edge(Seconds.Of(_s.TimeTolerance.Latest(delay.Value).Value + _s.OpeningTime.Value), EdgeSource.Setting, hsWhy));
                }
            }
        }

        var minimums = new List<BandEdge>();
        var maximums = new List<BandEdge>();
        if (m < 1 - p)
        {
            minimums.Add(BandEdge.NeverTrip($"below the pickup {_s.Pickup} less its {p * 100:0.#} % start accuracy the relay must not operate")
                with { ProvenByHolding = StartBound(MustOperateFrom) });
        }

        Add(minimums, guaranteed.Minimum(), EdgeStrength.Guaranteed);
        Add(minimums, typical.Minimum(), EdgeStrength.Typical);
        Add(maximums, guaranteed.Maximum(), EdgeStrength.Guaranteed);
        Add(maximums, typical.Maximum(), EdgeStrength.Typical);
        return TripBand.Of(current, current / Reference, minimums, maximums, "no requirement on the relay at this current");
    }

    private static void Add(List<BandEdge> edges, BandEdge? edge, EdgeStrength strength)
    {
        if (edge is { } e)
        {
            edges.Add(e with { Strength = strength });
        }
    }

    private static BandEdge Edge(Seconds limit, EdgeSource source, string why) =>
        new(limit, source, why, StartCondition.Cold) { AnyStart = true };

    // The lab's bound where the relay must operate but no accuracy is declared: the curve time at the multiple less the
    // start accuracy, with the time tolerance, times the policy factor, plus the breaker's opening time.
    private Seconds StartBound(double multiple)
    {
        var effective = Math.Max(multiple / (1 + _s.PickupTolerance), LabPolicy.RelayOperateThreshold);
        var curve = _s.TimeTolerance.Latest(_k.OperateSeconds(effective, _s.Tms)!.Value).Value;
        return Seconds.Of(LabPolicy.RelayStartBoundFactor * curve + _s.OpeningTime.Value);
    }

    private Seconds Earliest(double multiple) => _s.TimeTolerance.Earliest(_k.OperateSeconds(multiple, _s.Tms)!.Value);

    private Seconds Latest(double multiple) =>
        Seconds.Of(_s.TimeTolerance.Latest(_k.OperateSeconds(multiple, _s.Tms)!.Value).Value + _s.OpeningTime.Value);
}
