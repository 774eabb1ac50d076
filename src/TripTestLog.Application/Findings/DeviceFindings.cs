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
        InsulationRules.States(history, device.Insulation, ledger, policy, instruments);
        InsulationRules.Falling(history, device.Insulation, ledger, policy, instruments, asOf);

        var last = LastTested(device);
        var window = DueOn(device, last, GradeOf(ledger.All(), last), policy, asOf);

        // Forecasts are judged against the due date before any forecast (they can only shorten it); their grade sets the
        // device's one due date, which their text then names: a first pass finds them, the second writes them.
        var trial = new FindingLedger();
        TripRules.TrendExit(points, trial, policy, window, window, asOf);
        ContactRules.TrendLimit(history, device.Contacts, trial, policy, instruments, window, window, asOf);
        var grade = GradeOf([.. ledger.All(), .. trial.All()], last);
        var due = DueOn(device, last, grade, policy, asOf);
        if (Forecast.AnyPast([.. ledger.All(), .. trial.All()], asOf) && due > asOf)
        {
            due = asOf;
        }

        TripRules.TrendExit(points, ledger, policy, window, due, asOf);
        ContactRules.TrendLimit(history, device.Contacts, ledger, policy, instruments, window, due, asOf);
        if (due < asOf || (grade == ConditionGrade.Untested && due == asOf))
        {
            ledger.Add(Overdue(device, policy, grade, last, due, asOf));
        }

        return new DeviceCondition(history.Latest, grade, last, due, ledger.All());
    }

    private static Finding Overdue(DeviceRecords device, FindingPolicy policy, ConditionGrade grade, DateOnly? last, DateOnly due, DateOnly asOf)
    {
        var latest = device.History.Latest;
        var months = policy.MonthsBetweenTests(latest.Family, grade);
        var at = last is { } l ? TestedAt.OnDate(l) : TestedAt.OnDate(due);
        var days = asOf.DayNumber - due.DayNumber;
        return new Finding(FindingKind.TestOverdue, Severity.Plan, latest.Tag, at,
            new DeviceFacts.Overdue(latest.Family, grade, months, last, latest.CommissionedOn, due, days), [])
        {
            Value = new Reading(days, ReadingUnit.Days),
            Limit = new Reading(0, ReadingUnit.Days),
            Policy = PolicyFile.Setting(policy, $"due_months.{TextCodes.Grade.Of(grade)}"),
        };
    }

    /// <summary>
    /// The grade from the worst open finding (an overdue test aside); a device with no as-found test of any kind and
    /// nothing worse open is <see cref="ConditionGrade.Untested"/>, not sound.
    /// </summary>
    private static ConditionGrade GradeOf(IEnumerable<Finding> findings, DateOnly? lastTested)
    {
        var worst = findings.Where(f => f.Open && f.Kind != FindingKind.TestOverdue).Select(f => (Severity?)f.Severity).Max();
        return worst switch
        {
            null or Severity.Investigate or Severity.Plan when lastTested is null => ConditionGrade.Untested,
            null => ConditionGrade.Sound,
            Severity.Investigate => ConditionGrade.Watch,
            Severity.Plan => ConditionGrade.PlanWork,
            Severity.Act => ConditionGrade.Repair,
            _ => ConditionGrade.TakeOutOfService,
        };
    }

    // A device never tested and with no commissioning date is due on the day judged.
    private static DateOnly DueOn(DeviceRecords device, DateOnly? last, ConditionGrade grade, FindingPolicy policy, DateOnly asOf)
    {
        var months = policy.MonthsBetweenTests(device.History.Latest.Family, grade);
        var from = last ?? device.History.Latest.CommissionedOn;
        return from is { } d ? d.AddMonths(months) : asOf;
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
