namespace TripTestLog.Domain.Envelopes;

/// <summary>Whether a band edge may fail a breaker or only raise an advisory.</summary>
public enum EdgeStrength
{
    /// <summary>
    /// From a requirement (a standard's point, carried only in the direction physics gives it; the standard's formula
    /// within its declared range; the device's own settings with their tolerances; the lab's registered curve points) or
    /// from physics (a thermal release needs at least the same I²t at a lower current). A test outside it fails.
    /// </summary>
    Guaranteed,

    /// <summary>
    /// A line drawn between requirements (log-log lines between a standard's points or a curve table's rows, I²t
    /// extrapolation, a relay formula outside its declared range). A test outside it raises an advisory, never a failure.
    /// </summary>
    Typical,
}
