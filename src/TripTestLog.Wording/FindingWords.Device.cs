using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;

namespace TripTestLog.Wording;

/// <summary>The words of the device rules' findings.</summary>
public static partial class FindingWords
{
    private static string OverdueBasis(DeviceFacts.Overdue f) => f.Grade == ConditionGrade.Untested
        ? $"lab policy: a first as-found test {f.Months} months after commissioning for a {TextCodes.Family.Of(f.Family)} breaker"
        : $"lab policy: an as-found test every {f.Months} months for a {TextCodes.Family.Of(f.Family)} breaker graded {TextCodes.Grade.Of(f.Grade)}";

    private static string Overdue(DeviceFacts.Overdue f) => f.LastTested is not { } last
        ? f.CommissionedOn is { } commissioned
            ? Invariant($"never tested; due since {f.Due:yyyy-MM-dd}, {f.DaysOverdue} days ago (commissioned {commissioned:yyyy-MM-dd}): schedule an as-found test")
            : "never tested, and the register gives no commissioning date: due now; schedule an as-found test"
        : f.Months == 0 ? Invariant($"graded {TextCodes.Grade.Of(f.Grade)} on its test of {last:yyyy-MM-dd}: repair it and test it again before it returns to service")
        : Invariant($"no as-found test since {last:yyyy-MM-dd}; the next was due on {f.Due:yyyy-MM-dd}, {f.DaysOverdue} days ago: schedule it");
}
