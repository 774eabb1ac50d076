namespace TripTestLog.Domain.Condition;

/// <summary>
/// What trends and charts do with a reading taken by an instrument that was not traceable on the day (out of
/// calibration, or unregistered where the lab requires registered instruments). The reading is still judged on its own.
/// </summary>
public enum UntraceableReadings
{
    /// <summary>Keep it in the trend, marked in the finding's text and on the chart (the default).</summary>
    Mark,

    /// <summary>Leave it out of trends and their charts; the finding says how many were left out.</summary>
    Exclude,
}
