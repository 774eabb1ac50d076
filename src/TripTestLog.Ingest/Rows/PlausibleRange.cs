using TripTestLog.Application.Records;
namespace TripTestLog.Ingest.Rows;

/// <summary>
/// Outer limits beyond which a value is taken as a typing or unit mistake, not a measurement.
/// Common practice for low-voltage breaker testing, chosen for this tool; none is a figure from a standard.
/// </summary>
internal static class PlausibleRange
{
    /// <summary>Largest test or rated current: 200 kA, beyond any low-voltage primary-injection set.</summary>
    public const double MaxCurrentA = 200_000;

    /// <summary>Longest trip or hold time: 24 h; the longest IEC 60898-1 requirement is 2 h.</summary>
    public const double MaxTimeS = 86_400;

    /// <summary>Shortest trip time: 0.1 ms, faster than any breaker mechanism opens.</summary>
    public const double MinTripTimeS = 0.0001;

    /// <summary>Largest contact resistance: 1 ohm (10^6 micro-ohm); a closed breaker pole is in the micro-ohm to milli-ohm range.</summary>
    public const double MaxContactUohm = 1_000_000;

    /// <summary>Largest insulation reading: 10 T-ohm (10^7 megohm), above any field insulation tester's range.</summary>
    public const double MaxInsulationMohm = 10_000_000;

    /// <summary>Largest test or rated voltage: 15 kV, above any low-voltage insulation test.</summary>
    public const double MaxVoltageV = 15_000;
}
