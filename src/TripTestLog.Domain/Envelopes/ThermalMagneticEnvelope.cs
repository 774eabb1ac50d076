using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of an IEC 60947-2 breaker with a thermal-magnetic release. The standard fixes only the conventional points
/// (1.05 Ir: no trip within the conventional time; 1.30 Ir: trip within it) and the magnetic pickup tolerance (±20 % of
/// Im). Between 1.05 Ir and the magnetic range it sets no band, so tests there are not assessable unless the device
/// has a curve table. Above 1.30 Ir the trip-by limit of the 1.30 Ir point is carried upward, because a thermal
/// release trips no later at a higher current; from 1.2 Im the magnetic release must clear within the lab's limit.
/// </summary>
public sealed class ThermalMagneticEnvelope : ITripEnvelope
{
    private readonly ThermalMagneticSettings _s;
    private readonly Seconds _conventional;
    private readonly double _thermalFactor;
    private readonly IReadOnlyList<NormativePoint> _points;

    /// <summary>Creates the envelope; <paramref name="thermalFactor"/> scales Ir for ambient (0.5 to 1.5).</summary>
    public ThermalMagneticEnvelope(Amperes rated, ThermalMagneticSettings settings, double thermalFactor = 1.0)
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

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => current.Value < (1 - Iec60947Conventions.PickupTolerance) * _s.Im.Value;

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var i = current.Value;
        var ir = _s.Ir.Value * _thermalFactor;
        var a = Iec60947Conventions.NonTrippingMultiple * ir;
        var b = Iec60947Conventions.TrippingMultiple * ir;
        var magneticLow = (1 - Iec60947Conventions.PickupTolerance) * _s.Im.Value;
        var magneticHigh = (1 + Iec60947Conventions.PickupTolerance) * _s.Im.Value;
        var carried = new BandEdge(_conventional, EdgeSource.NormativePoint, _points[1].Requirement + ", carried to higher currents", StartCondition.Warm);

        if (i < a * (1 - 1e-9))
        {
            var none = "IEC 60947-2 sets no trip band below 1.05 Ir";
            return new TripBand(current, m, BandEdge.NoMinimum(none), BandEdge.NoMaximum(none), none + "; test at 1.05 Ir or above");
        }

        var why = $"magnetic: Im {_s.Im} ±20 % (IEC 60947-2), clearing within {_s.InstantaneousMax} (lab policy)";
        if (i >= magneticHigh)
        {
            return new TripBand(current, m, BandEdge.NoMinimum(why), new BandEdge(_s.InstantaneousMax, EdgeSource.Setting, why, StartCondition.Cold), null);
        }

        if (i >= magneticLow)
        {
            return new TripBand(current, m, BandEdge.NoMinimum(why), i >= b ? carried : BandEdge.NoMaximum("below 1.30 Ir no trip is required"), null);
        }

        if (Math.Abs(i - a) <= 1e-9 * a)
        {
            return new TripBand(current, m, new BandEdge(_conventional, EdgeSource.NormativePoint, _points[0].Requirement, StartCondition.Cold),
                BandEdge.NoMaximum("1.05 Ir requires no trip"), null);
        }

        if (Math.Abs(i - b) <= 1e-9 * b)
        {
            return new TripBand(current, m, BandEdge.NoMinimum("1.30 Ir sets no minimum"), carried with { Requirement = _points[1].Requirement }, null);
        }

        var gap = "IEC 60947-2 sets no band between its conventional currents and the magnetic range";
        return new TripBand(current, m, BandEdge.NoMinimum(gap), i >= b ? carried : BandEdge.NoMaximum(gap),
            gap + "; enter the maker's curve as a curve table to judge tests here");
    }
}
