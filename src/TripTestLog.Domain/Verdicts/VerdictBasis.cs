namespace TripTestLog.Domain.Verdicts;

/// <summary>Whether a verdict rests on one of the standard's own test points or on the band drawn between them.</summary>
public enum VerdictBasis
{
    /// <summary>The test current and start condition match a point the standard defines, within <see cref="TripJudge.PointTolerance"/>.</summary>
    Normative,

    /// <summary>The test lies between the standard's points; the edge is interpolated or extrapolated.</summary>
    Band,
}
