using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>The band at one current for one set of test conditions: the guaranteed edges a test can fail on, and the
/// typical edges that only raise advisories.</summary>
/// <param name="Current">The current the band was evaluated at.</param>
/// <param name="Multiple">That current over the envelope's reference current.</param>
/// <param name="Conditions">The test conditions the band was reduced for.</param>
/// <param name="Minimum">The guaranteed minimum: a trip before it is too early.</param>
/// <param name="Maximum">The guaranteed maximum: a trip after it, or a hold to it, is too late.</param>
/// <param name="TypicalMinimum">A drawn minimum later than the guaranteed one, when there is one.</param>
/// <param name="TypicalMaximum">A drawn maximum earlier than the guaranteed one, when there is one.</param>
/// <param name="NoRequirement">When not null, the standard sets no requirement at this current, and this says why.</param>
public sealed record AppliedBand(
    Amperes Current,
    CurrentMultiple Multiple,
    TestConditions Conditions,
    BandEdge Minimum,
    BandEdge Maximum,
    BandEdge? TypicalMinimum,
    BandEdge? TypicalMaximum,
    string? NoRequirement)
{
    /// <summary>Whether the standard sets any requirement at this current.</summary>
    public bool HasRequirement => NoRequirement is null;

    /// <summary>The guaranteed band in words, e.g. "1 s to 60 s", "0 s to no limit" or "never to 100 ms".</summary>
    public string Range =>
        $"{(Minimum.IsOpen ? "0 s" : Minimum.Limit?.ToString() ?? "never")} to {(Maximum.Limit is { } max ? max.ToString() : "no limit")}";
}
