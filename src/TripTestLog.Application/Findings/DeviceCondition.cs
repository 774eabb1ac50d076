using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Findings;

/// <summary>A device's condition on a date: its grade, when its next test is due, and its findings, open and closed.</summary>
/// <param name="Device">The device's latest register entry.</param>
/// <param name="Grade">The grade from its open findings (an overdue test does not change it).</param>
/// <param name="LastTested">The date of its latest as-found test of any kind; null when it has none.</param>
/// <param name="DueOn">When its next as-found test is due: the latest test plus the policy's interval for its grade and family.</param>
/// <param name="Findings">Every finding, open first.</param>
public sealed record DeviceCondition(Device Device, ConditionGrade Grade, DateOnly? LastTested, DateOnly DueOn, IReadOnlyList<Finding> Findings)
{
    /// <summary>The findings still open.</summary>
    public IEnumerable<Finding> Open => Findings.Where(f => f.Open);

    /// <summary>Whether its test is overdue.</summary>
    public bool Overdue => Open.Any(f => f.Kind == FindingKind.TestOverdue);

    /// <summary>The soonest date an open forecast says it leaves its band or reaches a limit.</summary>
    public DateOnly? SoonestForecast => Open.Where(f => f.ForecastOn is not null).Select(f => f.ForecastOn).Min();

    /// <summary>
    /// The open finding that puts it where it is in the priority order: the most severe about its condition, else its
    /// overdue test; null when nothing is open.
    /// </summary>
    public Finding? WorstOpen => Open.OrderByDescending(f => f.Kind != FindingKind.TestOverdue).ThenByDescending(f => f.Severity).FirstOrDefault();

    /// <summary>Whether it belongs on a priority list at all: a grade below sound, or overdue.</summary>
    public bool NeedsAttention => Grade != ConditionGrade.Sound || Overdue;
}
