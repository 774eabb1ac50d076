namespace TripTestLog.Domain.Envelopes;

/// <summary>Where the value of a band edge comes from, so a reader can tell a normative limit from a drawn line.</summary>
public enum EdgeSource
{
    /// <summary>No limit on this side: zero for a minimum (may trip at once), unbounded for a maximum.</summary>
    None,

    /// <summary>A limit the standard states at a point, at its current or carried in the direction physics gives it.</summary>
    NormativePoint,

    /// <summary>A straight line on log-log axes between two points (typical: never fails a breaker alone).</summary>
    Interpolated,

    /// <summary>Extended beyond a point by I²t = constant, or a formula outside its declared range (typical).</summary>
    Extrapolated,

    /// <summary>The instantaneous (magnetic) release requirement.</summary>
    Instantaneous,

    /// <summary>The standard's own time-current formula (IEC 60255-151, IEEE C37.112) within its stated range.</summary>
    Characteristic,

    /// <summary>The device's settings with their tolerances (pickup tolerance from the standard, time tolerance by lab policy).</summary>
    Setting,

    /// <summary>A band the lab entered from the maker's published curve.</summary>
    CurveTable,

    /// <summary>Derived from a point by physics: a thermal release needs at least the same I²t at a lower current.</summary>
    Derived,
}
