using System.Globalization;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of a breaker tripped by an inverse-time overcurrent relay. The IDMT stage operates at
/// t = TMS (k / (M^alpha - 1) + c) (IEC 60255-151 Table 1; IEEE C37.112 Table 1), M = I / Is, within the time
/// tolerance (a percentage with a floor, the IEC 60255-151 form). The pickup tolerance p decides only whether it
/// operates: below Is (1 - p) it must not operate at all; from Is (1 + p) it must. In between it may, and then no
/// sooner than the characteristic allows at Is (1 + p), the shortest time it could have there. An optional
/// definite-time high-set stage is composed with it (<see cref="EdgeCandidates"/>). The breaker's opening time is added
/// to the latest time only. Within 2 to 20 x Is, the range over which IEC 60255-151 has accuracy declared (from memory),
/// edges are the standard's characteristic; outside it they are the same formula, marked extrapolated.
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

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var p = _s.PickupTolerance;
        var edges = new EdgeCandidates();
        var inRange = m.Value is >= AccuracyFrom and <= AccuracyTo;
        var source = inRange ? EdgeSource.Characteristic : EdgeSource.Extrapolated;
        var why = $"{_k.Source}: {CurveCodes.Of(_s.Curve)}, TMS {_s.Tms.ToString("0.###", CultureInfo.InvariantCulture)}, pickup ±{p * 100:0.#} %, {_s.TimeTolerance}"
            + (inRange ? "" : $" (outside {AccuracyFrom:0}-{AccuracyTo:0} x Is)");

        if (m.Value >= 1 - p && _k.OperateSeconds(Math.Max(m.Value, 1 + p), _s.Tms) is { } earliest)
        {
            edges.CouldAct(new BandEdge(_s.TimeTolerance.Earliest(earliest), source, why, StartCondition.Cold));
        }

        if (m.Value >= 1 + p && _k.OperateSeconds(m.Value, _s.Tms) is { } latest)
        {
            edges.MustAct(new BandEdge(Seconds.Of(_s.TimeTolerance.Latest(latest).Value + _s.OpeningTime.Value), source, why, StartCondition.Cold));
        }

        if (_s.HighSet is { } hs && _s.HighSetDelay is { } delay)
        {
            var hsWhy = $"high-set {hs} ±{p * 100:0.#} %, delay {delay}, {_s.TimeTolerance}";
            if (current.Value >= hs.Value * (1 - p))
            {
                edges.CouldAct(new BandEdge(_s.TimeTolerance.Earliest(delay.Value), EdgeSource.Setting, hsWhy, StartCondition.Cold));
            }

            if (current.Value >= hs.Value * (1 + p))
            {
                edges.MustAct(new BandEdge(Seconds.Of(_s.TimeTolerance.Latest(delay.Value).Value + _s.OpeningTime.Value), EdgeSource.Setting, hsWhy, StartCondition.Cold));
            }
        }

        var never = BandEdge.NeverTrip($"below the pickup {_s.Pickup} less its {p * 100:0.#} % tolerance the relay must not operate");
        return new TripBand(current, m, edges.Minimum(never), edges.Maximum("at or below the pickup plus its tolerance no operation is required"), null);
    }
}
