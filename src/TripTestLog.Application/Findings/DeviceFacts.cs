using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Findings;

/// <summary>What the device rules find, as values.</summary>
public static class DeviceFacts
{
    /// <summary>test-overdue: no as-found test by the due date the policy sets for the device's family and grade.</summary>
    /// <param name="Family">The device's family.</param>
    /// <param name="Grade">Its grade (untested: never tested).</param>
    /// <param name="Months">The policy's months between tests for that family and grade.</param>
    /// <param name="LastTested">The date of its latest as-found test, if any.</param>
    /// <param name="CommissionedOn">Its commissioning date from the register, if any.</param>
    /// <param name="Due">The due date.</param>
    /// <param name="DaysOverdue">Days past the due date on the day judged.</param>
    public sealed record Overdue(DeviceFamily Family, ConditionGrade Grade, int Months, DateOnly? LastTested, DateOnly? CommissionedOn, DateOnly Due,
        int DaysOverdue) : FindingFacts;
}
