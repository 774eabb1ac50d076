using System.Collections.Concurrent;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Instruments;

/// <summary>
/// Every accuracy figure a judgement needs, from the register or the lab policy's defaults. Each ±a is taken as a
/// rectangular distribution, whose standard uncertainty is a / √3 (GUM, JCGM 100:2008, 4.3.7).
/// </summary>
/// <param name="TimePercent">Time: per cent of the reading.</param>
/// <param name="TimeSeconds">Time: fixed part, s.</param>
/// <param name="CurrentPercent">Current: per cent of the reading.</param>
/// <param name="CurrentAmperes">Current: fixed part, A.</param>
/// <param name="ResistancePercent">Contact resistance: per cent of the reading.</param>
/// <param name="ResistanceMicroOhms">Contact resistance: fixed part, uOhm.</param>
/// <param name="InsulationPercent">Insulation resistance: per cent of the reading.</param>
/// <param name="CoverageFactor">k of U = k u.</param>
/// <param name="FromDefaults">The quantities taken from the lab policy's defaults, not the register.</param>
public sealed record ResolvedAccuracy(double TimePercent, double TimeSeconds, double CurrentPercent, double CurrentAmperes, double ResistancePercent,
    double ResistanceMicroOhms, double InsulationPercent, double CoverageFactor, IReadOnlyList<string> FromDefaults)
{
    private const int MostWordsKept = 1024;
    private static readonly double Root3 = Math.Sqrt(3);
    private static readonly ConcurrentDictionary<WordsKey, string> WordsKept = new();

    /// <summary>The standard uncertainty of a time reading <paramref name="time"/>, s.</summary>
    public double TimeStandard(Seconds time) => (TimePercent / 100 * time.Value + TimeSeconds) / Root3;

    /// <summary>The standard uncertainty of a current reading <paramref name="current"/>, A.</summary>
    public double CurrentStandard(Amperes current) => (CurrentPercent / 100 * current.Value + CurrentAmperes) / Root3;

    /// <summary>The standard uncertainty of a contact resistance reading of <paramref name="microOhms"/>, uOhm.</summary>
    public double ResistanceStandard(double microOhms) => (ResistancePercent / 100 * microOhms + ResistanceMicroOhms) / Root3;

    /// <summary>The standard uncertainty of an insulation reading of <paramref name="megaOhms"/>, MOhm.</summary>
    public double InsulationStandard(double megaOhms) => InsulationPercent / 100 * megaOhms / Root3;

    /// <summary>The accuracy figures in words, e.g. "time ±(0.5 % + 0.01 s), current ±2 %, k = 2".</summary>
    public string Words(bool time, bool current, bool resistance, bool insulation)
    {
        // Every test judged puts its instrument's figures in words, and a fleet has few instruments: the words are kept
        // by the figures and names they say (bounded, so a register of any size cannot grow it without end).
        var key = new WordsKey(Bits(TimePercent), Bits(TimeSeconds), Bits(CurrentPercent), Bits(CurrentAmperes), Bits(ResistancePercent),
            Bits(ResistanceMicroOhms), Bits(InsulationPercent), Bits(CoverageFactor), (time ? 1 : 0) | (current ? 2 : 0) | (resistance ? 4 : 0) | (insulation ? 8 : 0),
            DefaultsCode(time, current, resistance, insulation));
        if (WordsKept.TryGetValue(key, out var kept))
        {
            return kept;
        }

        if (WordsKept.Count >= MostWordsKept)
        {
            WordsKept.Clear();
        }

        return WordsKept[key] = WordsOf(time, current, resistance, insulation);
    }

    private readonly record struct WordsKey(long Tp, long Ts, long Cp, long Ca, long Rp, long Rm, long Ip, long K, int Asked, int Defaults);

    private static long Bits(double x) => BitConverter.DoubleToInt64Bits(x);

    // The defaults the words name, in their order: a digit in base 5 for each (time 1, current 2, resistance 3, insulation 4).
    private int DefaultsCode(bool time, bool current, bool resistance, bool insulation)
    {
        var code = 0;
        for (var i = 0; i < FromDefaults.Count; i++)
        {
            var digit = FromDefaults[i] switch
            {
                "time" when time => 1,
                "current" when current => 2,
                "resistance" when resistance => 3,
                "insulation" when insulation => 4,
                _ => 0,
            };
            code = digit == 0 ? code : (code * 5) + digit;
        }

        return code;
    }

    private string WordsOf(bool time, bool current, bool resistance, bool insulation)
    {
        static string Part(string name, double pct, double fixedPart, string unit) =>
            fixedPart == 0 ? Invariant($"{name} ±{pct:0.###} %") : pct == 0 ? Invariant($"{name} ±{fixedPart:0.####} {unit}") : Invariant($"{name} ±({pct:0.###} % + {fixedPart:0.####} {unit})");
        var parts = new List<string>();
        if (time)
        {
            parts.Add(Part("time", TimePercent, TimeSeconds, "s"));
        }

        if (current)
        {
            parts.Add(Part("current", CurrentPercent, CurrentAmperes, "A"));
        }

        if (resistance)
        {
            parts.Add(Part("resistance", ResistancePercent, ResistanceMicroOhms, "µΩ"));
        }

        if (insulation)
        {
            parts.Add(Part("insulation", InsulationPercent, 0, "MΩ"));
        }

        parts.Add(Invariant($"k = {CoverageFactor:0.##}"));
        var defaults = FromDefaults.Where(d => (time && d == "time") || (current && d == "current") || (resistance && d == "resistance") || (insulation && d == "insulation")).ToList();
        return string.Join(", ", parts) + (defaults.Count > 0 ? $"; {string.Join(" and ", defaults)} from the lab policy's defaults (not in the instrument register)" : "");
    }

    private static string Invariant(FormattableString s) => s.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
