namespace TripTestLog.Domain.Measurements;

/// <summary>The thermal state of the release when the test current was applied.</summary>
public enum StartCondition
{
    /// <summary>From cold: at ambient temperature, no load before the test (IEC 60898-1, 8.6.1 reference conditions).</summary>
    Cold,

    /// <summary>Warm: straight after a previous test, e.g. 1.45 In immediately after the 1.13 In test.</summary>
    Warm,
}
