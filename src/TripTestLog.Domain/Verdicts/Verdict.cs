namespace TripTestLog.Domain.Verdicts;

/// <summary>How a trip test compares with the band its standard allows.</summary>
public enum Verdict
{
    /// <summary>Inside the band.</summary>
    Pass,

    /// <summary>Tripped where the device must still hold.</summary>
    TooEarly,

    /// <summary>Held past, or tripped after, the band's upper edge.</summary>
    TooLate,

    /// <summary>The test cannot be judged against the band; the assessment says why.</summary>
    NotAssessable,
}
