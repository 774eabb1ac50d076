namespace TripTestLog.Domain.Instruments;

/// <summary>
/// The accuracy an instrument is calibrated to, as the instrument register states it: each figure a half-width ±a of the
/// reading's error, a percentage of the reading plus a fixed part. A figure left blank is not stated (the lab policy's
/// default then applies); a quantity with one of its two parts stated takes the other as zero.
/// </summary>
public sealed record InstrumentAccuracy
{
    /// <summary>Nothing stated.</summary>
    public static InstrumentAccuracy None { get; } = new();

    /// <summary>Time: per cent of the reading.</summary>
    public double? TimePercent { get; init; }

    /// <summary>Time: fixed part, s.</summary>
    public double? TimeSeconds { get; init; }

    /// <summary>Test current: per cent of the reading.</summary>
    public double? CurrentPercent { get; init; }

    /// <summary>Test current: fixed part, A.</summary>
    public double? CurrentAmperes { get; init; }

    /// <summary>Contact resistance: per cent of the reading.</summary>
    public double? ResistancePercent { get; init; }

    /// <summary>Contact resistance: fixed part, uOhm.</summary>
    public double? ResistanceMicroOhms { get; init; }

    /// <summary>Insulation resistance: per cent of the reading.</summary>
    public double? InsulationPercent { get; init; }

    /// <summary>The coverage factor k of the expanded uncertainty U = k u.</summary>
    public double? CoverageFactor { get; init; }

    /// <summary>Whether no figure is stated.</summary>
    public bool IsEmpty => this == None;

    /// <summary>
    /// An accuracy from its figures; throws <see cref="ArgumentOutOfRangeException"/> for a percentage outside 0 to 100,
    /// a fixed part outside 0 to 10 s, 0 to 100,000 A or 0 to 1,000,000 uOhm, or a coverage factor outside 1 to 4, and for NaN
    /// or infinities.
    /// </summary>
    public static InstrumentAccuracy Of(double? timePercent = null, double? timeSeconds = null, double? currentPercent = null, double? currentAmperes = null,
        double? resistancePercent = null, double? resistanceMicroOhms = null, double? insulationPercent = null, double? coverageFactor = null) => new()
    {
        TimePercent = Check(timePercent, 0, 100, nameof(timePercent), "%"),
        TimeSeconds = Check(timeSeconds, 0, 10, nameof(timeSeconds), "s"),
        CurrentPercent = Check(currentPercent, 0, 100, nameof(currentPercent), "%"),
        CurrentAmperes = Check(currentAmperes, 0, 100_000, nameof(currentAmperes), "A"),
        ResistancePercent = Check(resistancePercent, 0, 100, nameof(resistancePercent), "%"),
        ResistanceMicroOhms = Check(resistanceMicroOhms, 0, 1_000_000, nameof(resistanceMicroOhms), "µΩ"),
        InsulationPercent = Check(insulationPercent, 0, 100, nameof(insulationPercent), "%"),
        CoverageFactor = Check(coverageFactor, 1, 4, nameof(coverageFactor), "(coverage factor)"),
    };

    /// <summary>
    /// This accuracy with every quantity it does not state taken from <paramref name="defaults"/>, and the names of the
    /// figures taken (<c>time</c>, <c>current</c>, <c>resistance</c>, <c>insulation</c>, <c>k</c>).
    /// </summary>
    public ResolvedAccuracy Over(InstrumentAccuracy defaults)
    {
        ArgumentNullException.ThrowIfNull(defaults);
        var taken = new List<string>();
        (double, double) Pair(double? p, double? f, double? dp, double? df, string name)
        {
            if (p is not null || f is not null)
            {
                return (p ?? 0, f ?? 0);
            }

            taken.Add(name);
            return (dp ?? 0, df ?? 0);
        }

        var time = Pair(TimePercent, TimeSeconds, defaults.TimePercent, defaults.TimeSeconds, "time");
        var current = Pair(CurrentPercent, CurrentAmperes, defaults.CurrentPercent, defaults.CurrentAmperes, "current");
        var resistance = Pair(ResistancePercent, ResistanceMicroOhms, defaults.ResistancePercent, defaults.ResistanceMicroOhms, "resistance");
        var insulation = Pair(InsulationPercent, null, defaults.InsulationPercent, null, "insulation");
        var k = Pair(CoverageFactor, null, defaults.CoverageFactor ?? 2, null, "k");
        return new ResolvedAccuracy(time.Item1, time.Item2, current.Item1, current.Item2, resistance.Item1, resistance.Item2, insulation.Item1, k.Item1, taken);
    }

    private static double? Check(double? value, double min, double max, string name, string unit) =>
        value is { } v ? Guard.InRange(v, min, max, name, unit) : null;
}
