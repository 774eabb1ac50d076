using TripTestLog.Application.Check;

namespace TripTestLog.Application.Findings;

/// <summary>One device with everything a report shows of it: its records, its judged trip tests, and its condition.</summary>
/// <param name="Records">Its register history and every reading.</param>
/// <param name="Trips">Its trip tests, judged, in time order.</param>
/// <param name="Condition">Its grade, due date and findings.</param>
public sealed record DeviceReport(DeviceRecords Records, IReadOnlyList<JudgedTrip> Trips, DeviceCondition Condition);
