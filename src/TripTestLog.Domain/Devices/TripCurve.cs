namespace TripTestLog.Domain.Devices;

/// <summary>The instantaneous tripping type of a miniature breaker (IEC 60898-1, clause 3.5.17 and Table 7).</summary>
public enum TripCurve
{
    /// <summary>Instantaneous release between 3 In and 5 In.</summary>
    B,

    /// <summary>Instantaneous release between 5 In and 10 In.</summary>
    C,

    /// <summary>Instantaneous release between 10 In and 20 In.</summary>
    D,
}
