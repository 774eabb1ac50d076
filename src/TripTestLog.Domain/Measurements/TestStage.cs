namespace TripTestLog.Domain.Measurements;

/// <summary>Whether a measurement was taken before or after maintenance work.</summary>
public enum TestStage
{
    /// <summary>As found, before any adjustment or cleaning.</summary>
    AsFound,

    /// <summary>As left, after the work, the state the device returns to service in.</summary>
    AsLeft,
}
