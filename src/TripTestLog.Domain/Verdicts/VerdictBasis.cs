namespace TripTestLog.Domain.Verdicts;

/// <summary>What kind of requirement a verdict rests on.</summary>
public enum VerdictBasis
{
    /// <summary>A point the standard defines (at its current, or carried in the direction physics gives it), or the
    /// standard's own time-current formula within its declared range.</summary>
    Normative,

    /// <summary>Another guaranteed edge: derived from a point by physics, the device's settings, or the lab's curve table.</summary>
    Band,
}
