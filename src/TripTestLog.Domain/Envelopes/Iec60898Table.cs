using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The time-current characteristic of IEC 60898-1 (Table 7, "Time-current operating characteristics"), rows a to e,
/// for one curve and one rated current, as currents in amperes, plus the single-pole point for multipole breakers.
/// Every number here is the standard's; the clause is named beside it. An ambient correction scales the thermal rows
/// (a, b, c and the single-pole point) only. The same rows serve RCBOs (IEC 61009-1) and d.c. breakers (IEC 60898-2),
/// whose instantaneous ranges differ.
/// </summary>
internal sealed record Iec60898Table
{
    /// <summary>Row a: conventional non-tripping current, 1.13 In, from cold.</summary>
    public const double NonTrippingMultiple = 1.13;

    /// <summary>Row b: conventional tripping current, 1.45 In, immediately after row a.</summary>
    public const double TrippingMultiple = 1.45;

    /// <summary>Row c: 2.55 In, from cold.</summary>
    public const double ThermalMultiple = 2.55;

    /// <summary>Row c lower limit: the device must not trip within 1 s ("1 s &lt; t").</summary>
    public const double ThermalMinimumSeconds = 1.0;

    /// <summary>Rows d and e: the instantaneous release must not act at t ≤ 0.1 s (d), must act at t &lt; 0.1 s (e).</summary>
    public const double InstantaneousSeconds = 0.1;

    private Iec60898Table(TripCurve curve, Amperes rated, double thermalFactor, int poles, Supply supply, string name)
    {
        Curve = curve;
        Rated = rated;
        ThermalFactor = thermalFactor;
        Poles = poles;
        Name = name;

        // Table 7, rows a and b: conventional time 1 h for In <= 63 A, 2 h for In > 63 A.
        ConventionalTime = Seconds.FromHours(rated.Value <= 63.0 ? 1.0 : 2.0);

        // Table 7, row c: 1 s < t < 60 s for In <= 32 A, 1 s < t < 120 s for In > 32 A.
        ThermalMaximum = Seconds.Of(rated.Value <= 32.0 ? 60.0 : 120.0);

        (InstantaneousLow, InstantaneousHigh) = (supply, curve) switch
        {
            // IEC 60898-1 Table 2: B above 3 In up to and including 5 In, C above 5 up to 10 In, D above 10 up to 20 In.
            (Supply.Ac, TripCurve.B) => (3.0, 5.0),
            (Supply.Ac, TripCurve.C) => (5.0, 10.0),
            (Supply.Ac, TripCurve.D) => (10.0, 20.0),

            // IEC 60898-2, d.c.: B 4 to 7 In, C 7 to 15 In (from memory: check the table of your edition). The standard's
            // marking clause admits only B and C for d.c. operation.
            (Supply.Dc, TripCurve.B) => (4.0, 7.0),
            (Supply.Dc, TripCurve.C) => (7.0, 15.0),
            _ => throw new ArgumentOutOfRangeException(nameof(curve), curve, "curve must be B, C or D on a.c., B or C on d.c."),
        };

        // IEC 60898-1 9.10.3, single-pole loading of a multipole breaker from cold (from memory of the clause number):
        // trip within the conventional time at 1.1 x 1.45 In for two poles, 1.2 x 1.45 In for three or four.
        SinglePoleMultiple = poles switch
        {
            2 => 1.1 * TrippingMultiple,
            >= 3 => 1.2 * TrippingMultiple,
            _ => null,
        };
    }

    public TripCurve Curve { get; }

    public Amperes Rated { get; }

    /// <summary>The ambient correction applied to the thermal rows; 1 when none.</summary>
    public double ThermalFactor { get; }

    public int Poles { get; }

    /// <summary>How requirements name their table, e.g. "IEC 60898-1 Table 7".</summary>
    public string Name { get; }

    public Seconds ConventionalTime { get; }

    public Seconds ThermalMaximum { get; }

    public double InstantaneousLow { get; }

    public double InstantaneousHigh { get; }

    public double? SinglePoleMultiple { get; }

    public double A => NonTrippingMultiple * ThermalFactor * Rated.Value;

    public double B => TrippingMultiple * ThermalFactor * Rated.Value;

    public double C => ThermalMultiple * ThermalFactor * Rated.Value;

    public double D => InstantaneousLow * Rated.Value;

    public double E => InstantaneousHigh * Rated.Value;

    public double? SinglePole => SinglePoleMultiple * ThermalFactor * Rated.Value;

    public static Iec60898Table For(TripCurve curve, Amperes rated, double thermalFactor, int poles, Supply supply, string name) =>
        new(curve, rated, thermalFactor, poles, supply, name);

    /// <summary>Rows a to e in rising current, then the single-pole point when the breaker has more than one pole.</summary>
    public IReadOnlyList<NormativePoint> Points()
    {
        var hours = ConventionalTime.Value / 3600.0;
        var th = ThermalMaximum.Value;
        var inst = Seconds.Of(InstantaneousSeconds);
        var f = ThermalFactor;
        var corrected = f == 1.0 ? "" : $" (x{f:0.###} for ambient)";
        var all = PoleLoading.AllPoles;

        // Row b is the conventional tripping current: a compliant release's ultimate tripping current lies below it.
        var ultimate = TrippingMultiple * f;
        var points = new List<NormativePoint>
        {
            new("a", CurrentMultiple.Of(NonTrippingMultiple * f), StartCondition.Cold, ConventionalTime, null,
                $"{Name} a: 1.13 In{corrected} from cold, no trip at t ≤ {hours:0} h") { HoldStrict = true, Loading = all, HighestUltimate = ultimate },
            new("b", CurrentMultiple.Of(TrippingMultiple * f), StartCondition.Warm, null, ConventionalTime,
                $"{Name} b: 1.45 In{corrected} straight after a, trip at t < {hours:0} h") { TripStrict = true, Loading = all, HighestUltimate = ultimate },
            new("c", CurrentMultiple.Of(ThermalMultiple * f), StartCondition.Cold, Seconds.Of(ThermalMinimumSeconds), ThermalMaximum,
                $"{Name} c: 2.55 In{corrected} from cold, trip at 1 s < t < {th:0} s") { HoldStrict = true, TripStrict = true, Loading = all, HighestUltimate = ultimate },

            // Each pole has its own magnetic release, so rows d and e hold whichever poles carry the current.
            new("d", CurrentMultiple.Of(InstantaneousLow), StartCondition.Cold, inst, null,
                $"{Name} d: {InstantaneousLow:0} In (curve {Curve}) from cold, no trip at t ≤ 0.1 s") { HoldStrict = true },
            new("e", CurrentMultiple.Of(InstantaneousHigh), StartCondition.Cold, null, inst,
                $"{Name} e: {InstantaneousHigh:0} In (curve {Curve}) from cold, trip at t < 0.1 s") { TripStrict = true },
        };
        if (SinglePoleMultiple is { } sp)
        {
            points.Add(new("1-pole", CurrentMultiple.Of(sp * f), StartCondition.Cold, null, ConventionalTime,
                $"IEC 60898-1 9.10.3 (from memory): one pole of {Poles} loaded from cold at {sp:0.###} In{corrected}, trip within {hours:0} h")
            {
                Loading = PoleLoading.OnePole,

                // One pole alone must trip at this point: its ultimate tripping current may lie just below it.
                HighestUltimate = sp * f,
            });
        }

        return points.OrderBy(p => p.Multiple.Value).ToList();
    }
}
