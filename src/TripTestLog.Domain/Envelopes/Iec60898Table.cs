using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The time-current characteristic of IEC 60898-1 (Table 7, "Time-current operating characteristics"), rows a to e,
/// for one curve and one rated current, as currents in amperes. Every number here is the standard's; the clause is
/// named beside it. An ambient correction scales the thermal rows (a, b, c) only.
/// </summary>
internal sealed record Iec60898Table
{
    /// <summary>Row a: conventional non-tripping current, 1.13 In, from cold.</summary>
    public const double NonTrippingMultiple = 1.13;

    /// <summary>Row b: conventional tripping current, 1.45 In, immediately after row a.</summary>
    public const double TrippingMultiple = 1.45;

    /// <summary>Row c: 2.55 In, from cold.</summary>
    public const double ThermalMultiple = 2.55;

    /// <summary>Row c lower limit: the device must not trip within 1 s.</summary>
    public const double ThermalMinimumSeconds = 1.0;

    /// <summary>Rows d and e: the instantaneous release acts, or must not act, within 0.1 s.</summary>
    public const double InstantaneousSeconds = 0.1;

    private Iec60898Table(TripCurve curve, Amperes rated, double thermalFactor)
    {
        Curve = curve;
        Rated = rated;
        ThermalFactor = thermalFactor;

        // Table 7, rows a and b: conventional time 1 h for In <= 63 A, 2 h for In > 63 A.
        ConventionalTime = Seconds.FromHours(rated.Value <= 63.0 ? 1.0 : 2.0);

        // Table 7, row c: 1 s < t < 60 s for In <= 32 A, 1 s < t < 120 s for In > 32 A.
        ThermalMaximum = Seconds.Of(rated.Value <= 32.0 ? 60.0 : 120.0);

        // Table 7, rows d and e; instantaneous tripping ranges of Table 2:
        // B above 3 In up to and including 5 In, C above 5 up to 10 In, D above 10 up to 20 In.
        (InstantaneousLow, InstantaneousHigh) = curve switch
        {
            TripCurve.B => (3.0, 5.0),
            TripCurve.C => (5.0, 10.0),
            TripCurve.D => (10.0, 20.0),
            _ => throw new ArgumentOutOfRangeException(nameof(curve), curve, "curve must be B, C or D"),
        };
    }

    public TripCurve Curve { get; }

    public Amperes Rated { get; }

    /// <summary>The ambient correction applied to the thermal rows; 1 when none.</summary>
    public double ThermalFactor { get; }

    public Seconds ConventionalTime { get; }

    public Seconds ThermalMaximum { get; }

    public double InstantaneousLow { get; }

    public double InstantaneousHigh { get; }

    public double A => NonTrippingMultiple * ThermalFactor * Rated.Value;

    public double B => TrippingMultiple * ThermalFactor * Rated.Value;

    public double C => ThermalMultiple * ThermalFactor * Rated.Value;

    public double D => InstantaneousLow * Rated.Value;

    public double E => InstantaneousHigh * Rated.Value;

    public static Iec60898Table For(TripCurve curve, Amperes rated, double thermalFactor) => new(curve, rated, thermalFactor);

    public IReadOnlyList<NormativePoint> Points()
    {
        var hours = ConventionalTime.Value / 3600.0;
        var th = ThermalMaximum.Value;
        var inst = Seconds.Of(InstantaneousSeconds);
        var f = ThermalFactor;
        var corrected = f == 1.0 ? "" : $" (x{f:0.###} for ambient)";
        return
        [
            new("a", CurrentMultiple.Of(NonTrippingMultiple * f), StartCondition.Cold, ConventionalTime, null,
                $"IEC 60898-1 Table 7 a: 1.13 In{corrected} from cold, no trip within {hours:0} h"),
            new("b", CurrentMultiple.Of(TrippingMultiple * f), StartCondition.Warm, null, ConventionalTime,
                $"IEC 60898-1 Table 7 b: 1.45 In{corrected} straight after a, trip within {hours:0} h"),
            new("c", CurrentMultiple.Of(ThermalMultiple * f), StartCondition.Cold, Seconds.Of(ThermalMinimumSeconds), ThermalMaximum,
                $"IEC 60898-1 Table 7 c: 2.55 In{corrected} from cold, trip between 1 s and {th:0} s"),
            new("d", CurrentMultiple.Of(InstantaneousLow), StartCondition.Cold, inst, null,
                $"IEC 60898-1 Table 7 d: {InstantaneousLow:0} In (curve {Curve}) from cold, no trip within 0.1 s"),
            new("e", CurrentMultiple.Of(InstantaneousHigh), StartCondition.Cold, null, inst,
                $"IEC 60898-1 Table 7 e: {InstantaneousHigh:0} In (curve {Curve}) from cold, trip within 0.1 s"),
        ];
    }
}
