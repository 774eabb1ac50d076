using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>The measurement uncertainty behind a verdict and the decision rule it was given under.</summary>
/// <param name="Rule">The lab's decision rule.</param>
/// <param name="Time">The expanded uncertainty of the deciding quantity, the trip (or hold) time against the deciding
/// limit, with the current's share through the limit's slope; null where no limit applies.</param>
/// <param name="CurrentAmperes">The expanded uncertainty of the test current, A.</param>
/// <param name="Conformity">Under the non-binary rule, the statement of conformity; else null.</param>
/// <param name="Conditional">True when the result lies within the guard band of the limit, or the current's uncertainty
/// could change the verdict: a more accurate instrument would decide.</param>
/// <param name="Accuracy">The accuracy figures used, in words, saying which came from the lab policy's defaults.</param>
/// <param name="FromDefaults">The quantities whose accuracy came from the lab policy's defaults, not the register.</param>
public sealed record VerdictUncertainty(DecisionRule Rule, Seconds? Time, double CurrentAmperes, Conformity? Conformity, bool Conditional, string Accuracy,
    IReadOnlyList<string> FromDefaults);
