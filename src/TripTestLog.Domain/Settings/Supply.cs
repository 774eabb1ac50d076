namespace TripTestLog.Domain.Settings;

/// <summary>The kind of supply a miniature breaker is rated and tested for; its instantaneous range differs.</summary>
public enum Supply
{
    /// <summary>Alternating current: IEC 60898-1.</summary>
    Ac,

    /// <summary>Direct current: IEC 60898-2, curves B and C only.</summary>
    Dc,
}
