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

    /// <summary>
    /// How far past its limit the device's worst open finding lies, as a fraction of the limit (0.05: 5 % past), the
    /// largest over the open findings of its worst severity; null when none of them carries a value past a limit (a
    /// forecast, a finding with no value, an overdue test). Any open finding with a value and a limit in one unit counts.
    /// </summary>
    public double? Margin
    {
        get
        {
            var open = Open.Where(f => f.Kind != FindingKind.TestOverdue).ToList();
            if (open.Count == 0)
            {
                return null;
            }

            var worst = open.Max(f => f.Severity);
            return open.Where(f => f.Severity == worst).Select(MarginOf).Max();
        }
    }

    /// <summary>The earliest date that matters for it: its soonest forecast or its due date.</summary>
    public DateOnly SoonestDate => SoonestForecast is { } on && on < DueOn ? on : DueOn;

    /// <summary>The margin of one finding past its limit, as a fraction of the limit; null for a forecast or a finding without both.</summary>
    public static double? MarginOf(Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return finding.ForecastOn is null && finding.Value is { } v && finding.Limit is { } l && v.Unit == l.Unit && l.Amount != 0
            ? Math.Abs(v.Amount - l.Amount) / Math.Abs(l.Amount)
            : null;
    }

    /// <summary>Whether it belongs on a priority list at all: a grade below sound, or overdue.</summary>
    public bool NeedsAttention => Grade != ConditionGrade.Sound || Overdue;
}
