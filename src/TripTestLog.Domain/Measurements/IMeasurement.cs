using TripTestLog.Domain.Devices;

namespace TripTestLog.Domain.Measurements;

/// <summary>What every measurement of a device has: the device, when, and at which stage of the work.</summary>
public interface IMeasurement
{
    /// <summary>The device measured.</summary>
    AssetTag Tag { get; }

    /// <summary>When.</summary>
    TestedAt TestedAt { get; }

    /// <summary>As-found or as-left.</summary>
    TestStage Stage { get; }
}
