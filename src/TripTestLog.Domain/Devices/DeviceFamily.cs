namespace TripTestLog.Domain.Devices;

/// <summary>The kind of breaker, which decides the standard and the envelope a trip test is judged against.</summary>
public enum DeviceFamily
{
    /// <summary>A miniature circuit-breaker for household and similar installations, IEC 60898-1, curve B, C or D.</summary>
    Iec60898,

    /// <summary>An industrial breaker with an electronic trip unit, IEC 60947-2, judged from its settings.</summary>
    Iec60947Electronic,

    /// <summary>An industrial breaker with a thermal-magnetic release, IEC 60947-2.</summary>
    Iec60947ThermalMagnetic,

    /// <summary>A breaker tripped by an inverse-time overcurrent relay (IEC 60255-151 or IEEE C37.112 curves).</summary>
    RelayIdmt,

    /// <summary>A breaker judged by a band the lab entered from the maker's published curve.</summary>
    CurveTable,

    /// <summary>A residual-current breaker with integral overcurrent protection (RCBO), IEC 61009-1, curve B, C or D.</summary>
    Iec61009,
}
