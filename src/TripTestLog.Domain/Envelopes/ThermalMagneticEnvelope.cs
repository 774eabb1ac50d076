using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of an IEC 60947-2 breaker with a thermal-magnetic release. The standard fixes only the conventional points
/// and the magnetic pickup: no trip within the conventional time at and below 1.05 Ir (from cold); a trip within it at
/// and above 1.30 Ir (straight after the 1.05 Ir test, so from warm: a thermal release trips no later at a higher
/// current, so the limit is carried upward); no magnetic operation at or below 0.8 Im, operation from 1.2 Im within the
/// lab's clearing limit. Between 1.05 Ir and the magnetic range it sets no minimum, so only a curve table can judge an
/// early trip there; a cold trip within the conventional time above 1.30 Ir meets the carried limit a fortiori, while a
/// cold trip or hold past it proves nothing (a warm release would have tripped sooner).
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
        var magnetic = new NormativePoint("0.8Im", CurrentMultiple.Of(NoMagneticFraction * settings.Im.Value / settings.Ir.Value), StartCondition.Cold,
            NoMagneticHold, null, $"IEC 60947-2 8.3.3.1.2: 0.8 Im ({settings.Im} set), the magnetic release does not operate within {NoMagneticHold} (from memory)")
        {
            HoldStrict = true, AnyStart = true,
        };
        _points = [.. Iec60947Conventions.Points(_conventional, thermalFactor, anyStart: false, PoleLoading.AllPoles), magnetic];
    }

    /// <summary>The magnetic release's no-operation point: 80 % of Im (IEC 60947-2, from memory).</summary>
    public const double NoMagneticFraction = 1 - 0.20;

    /// <summary>
    /// How long the magnetic release must not operate at 80 % of Im: 0.2 s, the duration of the no-operation test (IEC
    /// 60947-2 8.3.3.1.2, from memory; check your edition). Carried to lower currents, where no release trips sooner.
    /// </summary>
    public static Seconds NoMagneticHold => Seconds.Of(0.2);

    /// <inheritdoc />
    public string Standard => "IEC 60947-2";

    /// <inheritdoc />
    public string ReferenceName => "Ir";

    /// <inheritdoc />
    public Amperes Reference => _s.Ir;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => _points;

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => !Iec60947Conventions.MayOperate(current.Value, _s.Im.Value);

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var i = current.Value;
        var ir = _s.Ir.Value * _thermalFactor;
        var a = Iec60947Conventions.NonTrippingMultiple * ir;
        var b = Iec60947Conventions.TrippingMultiple * ir;
        var atA = Math.Abs(i - a) <= 1e-9 * a;
        var atB = Math.Abs(i - b) <= 1e-9 * b;
        var magneticMay = Iec60947Conventions.MayOperate(i, _s.Im.Value);
        var minimums = new List<BandEdge>();
        var maximums = new List<BandEdge>();

        // The magnetic release may act at once above 0.8 Im, whatever the thermal one does.
        if (!magneticMay && (i <= a || atA))
        {
            minimums.Add(_points[0].HoldEdge(carried: !atA));
        }

        if (i >= b || atB)
        {
            maximums.Add(_points[1].TripEdge(carried: !atB));
        }

        var noMagnetic = NoMagneticFraction * _s.Im.Value;
        var atM = Math.Abs(i - noMagnetic) <= 1e-9 * noMagnetic;
        if (i <= noMagnetic || atM)
        {
            minimums.Add(_points[2].HoldEdge(carried: !atM));
        }

        if (Iec60947Conventions.MustOperate(i, _s.Im.Value))
        {
            var why = $"magnetic: Im {_s.Im}, no operation at 0.8 Im, operation at 1.2 Im (IEC 60947-2), clearing within {_s.InstantaneousMax} (lab policy)";
            maximums.Add(new BandEdge(_s.InstantaneousMax, EdgeSource.Setting, why, StartCondition.Cold) { AnyStart = true });
        }

        return TripBand.Of(current, m, minimums, maximums,
            "IEC 60947-2 sets no band between 1.05 and 1.30 Ir below the magnetic range; enter the maker's curve as a curve table to judge tests here");
    }
}
