using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>A test point a standard defines: a current multiple, a start condition and the time limits at it.</summary>
/// <param name="Label">Short name of the point within its standard, e.g. "a" for IEC 60898-1 Table 7 row a.</param>
/// <param name="Multiple">The test current as a multiple of the reference current.</param>
/// <param name="Start">The start condition the standard prescribes.</param>
/// <param name="MustHoldFor">The time the device must carry the current without tripping, if any.</param>
/// <param name="MustTripWithin">The time within which the device must trip, if any.</param>
/// <param name="Requirement">The requirement in plain words, with its source.</param>
public sealed record NormativePoint(
    string Label,
    CurrentMultiple Multiple,
    StartCondition Start,
    Seconds? MustHoldFor,
    Seconds? MustTripWithin,
    string Requirement)
{
    /// <summary>
    /// The band this point alone sets, for a test matched to it: its hold time as the minimum, its trip time as the
    /// maximum, and no limit where the point sets none.
    /// </summary>
    public TripBand BandAt(Amperes current, CurrentMultiple multiple)
    {
        var min = MustHoldFor is { } hold
            ? new BandEdge(hold, EdgeSource.NormativePoint, Requirement, Start)
            : BandEdge.NoMinimum($"{Requirement}: sets no minimum");
        var max = MustTripWithin is { } trip
            ? new BandEdge(trip, EdgeSource.NormativePoint, Requirement, Start)
            : BandEdge.NoMaximum($"{Requirement}: requires no trip");
        return new TripBand(current, multiple, min, max, null);
    }
}
