using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Verdicts;
using static TripTestLog.Reports.Html.Markup;

namespace TripTestLog.Reports.Html;

/// <summary>
/// The words every page uses for the lab's decision rule (ILAC-G8:09/2019; ISO/IEC 17025:2017, 7.8.6 asks a report to
/// state the rule used), the expanded uncertainty beside a verdict, and which accuracies came from the policy's defaults.
/// </summary>
internal static class DecisionText
{
    /// <summary>The rule in one sentence, its code first so a reader can find it in the policy file.</summary>
    public static string Rule(FindingPolicy policy)
    {
        var code = TextCodes.DecisionRule.Of(policy.DecisionRule);
        var w = policy.GuardBandFactor == 1 ? "w = U" : $"w = {N(policy.GuardBandFactor)} x U";
        return policy.DecisionRule switch
        {
            DecisionRule.Guarded => $"Decision rule: {code} (guarded acceptance and rejection, ILAC-G8:09/2019), guard band {w}, U the expanded "
                + "uncertainty: a pass needs the limit cleared by w and a failure needs it broken by w; a result in between is not assessable, "
                + "within the measurement uncertainty of the limit, and a retest with a more accurate instrument is asked for.",
            DecisionRule.NonBinary => $"Decision rule: {code} (ILAC-G8:09/2019), guard band {w}, U the expanded uncertainty: each verdict is "
                + "the limit as written, with a statement beside it: pass, conditional pass (inside the limit by less than w), conditional fail "
                + "(outside by less than w) or fail; a conditional result asks for a retest with a more accurate instrument.",
            _ => $"Decision rule: {code} (simple acceptance, ILAC-G8:09/2019): each verdict is the limit as written, the reading taken as exact; "
                + "the expanded uncertainty U is shown beside it and does not change it, so a result within U of its limit may be a false "
                + "pass or a false failure.",
        };
    }

    /// <summary>The rule's name for the sign-off block.</summary>
    public static string Short(FindingPolicy policy) => policy.DecisionRule switch
    {
        DecisionRule.Guarded => $"guarded acceptance and rejection, guard band {(policy.GuardBandFactor == 1 ? "w = U" : $"w = {N(policy.GuardBandFactor)} x U")}",
        DecisionRule.NonBinary => $"non-binary statements (pass, conditional pass, conditional fail, fail), guard band {(policy.GuardBandFactor == 1 ? "w = U" : $"w = {N(policy.GuardBandFactor)} x U")}",
        _ => "simple acceptance (the limit as written)",
    } + $" ({TextCodes.DecisionRule.Of(policy.DecisionRule)}, ILAC-G8:09/2019)";

    /// <summary>The expanded uncertainty beside a verdict, and the statement of conformity under the non-binary rule.</summary>
    public static string Beside(VerdictUncertainty? u)
    {
        if (u is null)
        {
            return "";
        }

        var parts = new List<string>();
        if (u.Time is { } t)
        {
            parts.Add($"U = {Num(t.Value)} s");
        }

        if (u.CurrentAmperes > 0)
        {
            parts.Add($"U(I) = {Num(u.CurrentAmperes)} A");
        }

        if (u.Conformity is { } c)
        {
            parts.Add(TextCodes.Conformity.Of(c));
        }

        return parts.Count == 0 ? "" : $" ({string.Join("; ", parts)})";
    }

    /// <summary>
    /// The sentence on the register's accuracy columns: the instruments that state none, for which the policy's defaults
    /// apply; null when every registered instrument states its accuracy.
    /// </summary>
    public static string? Defaults(InstrumentRegister register, FindingPolicy policy)
    {
        var all = register.Instruments.ToList();
        var none = all.Where(i => !register.StatesAccuracy(i)).ToList();
        var words = InstrumentAccuracy.None.Over(policy.DefaultAccuracy);
        var figures = $"time ±{Pair(words.TimePercent, words.TimeSeconds, "s")}, current ±{Pair(words.CurrentPercent, words.CurrentAmperes, "A")}, "
            + $"contact resistance ±{Pair(words.ResistancePercent, words.ResistanceMicroOhms, "µΩ")}, insulation ±{N(words.InsulationPercent)} %, "
            + $"k = {N(words.CoverageFactor)}";
        if (none.Count == 0)
        {
            return all.Count == 0 ? $"Accuracy: the instrument register is empty, so the lab policy's default accuracies apply to every test ({figures})." : null;
        }

        var which = none.Count == all.Count ? $"any of its {all.Count} instruments" : $"{none.Count} of its {all.Count} instruments ({string.Join(", ", none)})";
        return $"Accuracy: the instrument register states no accuracy for {which}; for them, and for any unregistered instrument, the lab policy's "
            + $"default accuracies apply: {figures}.";
    }

    /// <summary>An instrument's accuracy in a few words, saying which figures came from the policy's defaults.</summary>
    public static string Brief(ResolvedAccuracy accuracy, bool trips, bool contacts)
    {
        var figures = accuracy.Words(trips, trips, contacts, insulation: false).Split("; ")[0];
        var defaults = accuracy.FromDefaults.Where(d => (trips && d is "time" or "current") || (contacts && d == "resistance") || d == "k").ToList();
        return figures + (defaults.Count == 0 ? "" : $" ({string.Join(", ", defaults)}: policy defaults, none in the register)");
    }

    private static string Pair(double pct, double fixedPart, string unit) =>
        fixedPart == 0 ? $"{N(pct)} %" : pct == 0 ? $"{N(fixedPart, "0.####")} {unit}" : $"({N(pct)} % + {N(fixedPart, "0.####")} {unit})";

    /// <summary>A time or current for a person: three significant figures or so.</summary>
    public static string Num(double x) => N(x, x >= 100 ? "0" : x >= 10 ? "0.#" : x >= 1 ? "0.##" : "0.###");
}
