using System.Globalization;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>
/// One device's findings, grade and due date. The order matters: findings on the tests themselves give a first grade;
/// that grade's due date bounds the forecasts ("before the next test is due"); the forecasts can only worsen the grade,
/// which sets the final due date; an overdue test is judged against that.
/// </summary>
internal static class DeviceFindings
{
    public static DeviceCondition Of(DeviceRecords device, IReadOnlyList<JudgedTrip> trips, PeerGroups peers, FindingPolicy policy,
        InstrumentRegister instruments, DateOnly asOf)
    {
        var history = device.History;
        var ledger = new FindingLedger();
        var points = TripRules.ByPoint(trips);
        TripRules.States(trips, ledger);
        TripRules.Drift(points, ledger, policy);
        PeerRule.Apply(points, peers, ledger, policy);
        ContactRules.States(history, device.Contacts, ledger, policy, instruments);
        InsulationRules.States(history, device.Insulation, ledger, policy);
        InsulationRules.Falling(history, device.Insulation, ledger, policy);

        var last = LastTested(device);
        var first = GradeOf(ledger.All());
        var due = DueOn(device, last, first, policy, asOf);
        TripRules.TrendExit(points, ledger, policy, due);
        ContactRules.TrendLimit(history, device.Contacts, ledger, policy, due);

        var grade = GradeOf(ledger.All());
        due = DueOn(device, last, grade, policy, asOf);
        if (due < asOf)
        {
            var months = policy.MonthsBetweenTests(history.Latest.Family, grade);
            var at = last is { } l ? TestedAt.OnDate(l) : TestedAt.OnDate(due);
            ledger.Add(new Finding(FindingKind.TestOverdue, Severity.Plan, history.Latest.Tag, at,
                $"lab policy: an as-found test every {months} months for a {TextCodes.Family.Of(history.Latest.Family)} breaker graded {TextCodes.Grade.Of(grade)}",
                last is not { } d ? "no as-found test on record: schedule one"
                : months == 0 ? string.Create(CultureInfo.InvariantCulture, $"graded {TextCodes.Grade.Of(grade)} on its test of {d:yyyy-MM-dd}: repair it and test it again before it returns to service")
                : string.Create(CultureInfo.InvariantCulture, $"no as-found test since {d:yyyy-MM-dd}; the next was due on {due:yyyy-MM-dd}, {asOf.DayNumber - due.DayNumber} days ago: schedule it"),
                [])
            {
                Value = new Reading(asOf.DayNumber - due.DayNumber, ReadingUnit.Days),
                Limit = new Reading(0, ReadingUnit.Days),
                Policy = PolicyFile.Setting(policy, $"due_months.{TextCodes.Grade.Of(grade)}"),
            });
        }

        return new DeviceCondition(history.Latest, grade, last, due, ledger.All());
    }

    private static ConditionGrade GradeOf(IEnumerable<Finding> findings)
    {
        var worst = findings.Where(f => f.Open && f.Kind != FindingKind.TestOverdue).Select(f => (Severity?)f.Severity).Max();
        return worst switch
        {
            null => ConditionGrade.Sound,
            Severity.Investigate => ConditionGrade.Watch,
            Severity.Plan => ConditionGrade.PlanWork,
            Severity.Act => ConditionGrade.Repair,
            _ => ConditionGrade.TakeOutOfService,
        };
    }

    private static DateOnly DueOn(DeviceRecords device, DateOnly? last, ConditionGrade grade, FindingPolicy policy, DateOnly asOf)
    {
        var months = policy.MonthsBetweenTests(device.History.Latest.Family, grade);
        var from = last ?? device.History.Latest.CommissionedOn;
        return from is { } d ? d.AddMonths(months) : asOf.AddDays(-1);
    }

    private static DateOnly? LastTested(DeviceRecords device)
    {
        DateOnly? last = null;
        foreach (var date in device.Trips.Where(t => t.Measurement.Stage == TestStage.AsFound).Select(t => t.Measurement.TestedAt.Date)
            .Concat(device.Contacts.Where(c => c.Measurement.Stage == TestStage.AsFound).Select(c => c.Measurement.TestedAt.Date))
            .Concat(device.Insulation.Where(i => i.Measurement.Stage == TestStage.AsFound).Select(i => i.Measurement.TestedAt.Date)))
        {
            last = last is { } l && l >= date ? l : date;
        }

        return last;
    }
}
