namespace TripTestLog.Domain.Devices;

/// <summary>The kind of breaker, which decides the standard and the envelope a trip test is judged against.</summary>
public enum DeviceFamily
{
    /// <summary>A miniature circuit-breaker for household and similar installations, IEC 60898-1, curve B, C or D.</summary>
    Iec60898,
}
