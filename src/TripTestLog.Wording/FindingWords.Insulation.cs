using TripTestLog.Application.Findings;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Wording;

/// <summary>The words of the insulation resistance rules' findings.</summary>
public static partial class FindingWords
{
    private static string InsulationWithinUncertainty(InsulationFacts.WithinUncertainty f) =>
        Invariant($"path {f.Path} reads {ResistanceText.MegaOhms(f.Corrected)} against the minimum of {ResistanceText.MegaOhms(f.Minimum)}, within the guard band of {ResistanceText.MegaOhms(f.Guard)} (U = {ResistanceText.MegaOhms(f.Expanded)}; {f.Accuracy.Words(false, false, false, true)}): retest with a more accurate instrument");

    private static string BelowMinimum(InsulationFacts.BelowMinimum f)
    {
        var voltage = f.TestVolts < f.TableVolts
            ? Invariant($" (tested at {f.TestVolts:0} V DC; the table's minimum assumes {f.TableVolts:0} V DC)")
            : "";
        return Invariant($"path {f.Path} reads {Describe(f.Reading)}, below the minimum of {ResistanceText.MegaOhms(f.Minimum)} for a {f.RatedVolts:0} V breaker{voltage}; find and remove the cause (moisture, dirt, damage) before returning it to service");
    }

    private static string TestVoltage(InsulationFacts.TestVoltage f) =>
        Invariant($"path {f.Path} was tested at {f.TestVolts:0} V DC; the table asks {f.TableVolts:0} V DC for a {f.RatedVolts:0} V breaker, so its reading ({Describe(f.Reading)}) does not show the insulation sound at that voltage; retest at {f.TableVolts:0} V DC");

    private static string Falling(InsulationFacts.Falling f)
    {
        var reach = f.ReachesOn is { } on && f.Minimum is { } minimum
            ? on < f.AsOf
                ? Invariant($" and has probably fallen below the minimum of {ResistanceText.MegaOhms(minimum)} since about {on:yyyy-MM-dd} (judged on {f.AsOf:yyyy-MM-dd}): test it now")
                : Invariant($" and would reach the minimum of {ResistanceText.MegaOhms(minimum)} about {on:yyyy-MM-dd}")
            : "";
        return Invariant($"path {f.Path} falls about {f.FallPercentPerYear:0}% a year ({ResistanceText.Number(f.First, null)} to {ResistanceText.MegaOhms(f.Last)} {Compared(f.Rule)} since {f.FirstOn:yyyy-MM-dd})")
            + reach
            + "; look for moisture, contamination or tracking"
            + Untraceable(f.Untraceable);
    }

    // Under insulation_correction = none a reading is compared as measured, and never called a 20 °C value.
    private static string Referred(InsulationCorrectionRule rule) => rule == InsulationCorrectionRule.None ? "compared as measured" : "referred to 20 °C";

    private static string Compared(InsulationCorrectionRule rule) => rule == InsulationCorrectionRule.None ? "as measured" : "at 20 °C";

    private static string InsulationSetting(InsulationCorrectionRule rule) =>
        PolicyFile.Setting(FindingPolicy.Default with { InsulationCorrection = rule }, "insulation_correction");

    private static string Describe(InsulationFacts.PathReading r) => r.Celsius is { } c
        ? r.Rule == InsulationCorrectionRule.None
            ? Invariant($"{ResistanceText.MegaOhms(r.Measured)} as measured at {c:0.#} °C (not corrected: {InsulationSetting(r.Rule)})")
            : Invariant($"{ResistanceText.MegaOhms(r.Corrected)} at 20 °C ({ResistanceText.MegaOhms(r.Measured)} as measured at {c:0.#} °C; {InsulationSetting(r.Rule)})")
        : Invariant($"{ResistanceText.MegaOhms(r.Measured)} (no temperature recorded: not corrected)");
}
