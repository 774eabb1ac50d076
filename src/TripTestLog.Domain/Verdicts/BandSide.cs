namespace TripTestLog.Domain.Verdicts;

/// <summary>A side of the trip-time band.</summary>
public enum BandSide
{
    /// <summary>The minimum edge: the device must not trip before it.</summary>
    Minimum,

    /// <summary>The maximum edge: the device must trip by it.</summary>
    Maximum,
}
