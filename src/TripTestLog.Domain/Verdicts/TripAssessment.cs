using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Domain.Verdicts;

/// <summary>The judgement of one trip test: verdict, basis, the band used, the margin and the reason in words.</summary>
/// <param name="Measurement">The test judged.</param>
/// <param name="Band">The band at the measured current for the test's conditions: the guaranteed edges it was held to.</param>
/// <param name="Verdict">Pass, too early, too late or not assessable.</param>
/// <param name="Basis">Normative (a standard's point or formula) or band (derived, setting or curve-table edges).</param>
/// <param name="Point">The standard's point the verdict rests on, or the one the test was aimed at.</param>
/// <param name="Margin">Where the measured time lies in the band.</param>
/// <param name="Reason">Plain words a technician can act on.</param>
public sealed record TripAssessment(
    TripMeasurement Measurement,
    AppliedBand Band,
    Verdict Verdict,
    VerdictBasis Basis,
    NormativePoint? Point,
    Margin Margin,
    string Reason)
{
    /// <summary>Remarks beside the verdict: settings found at the test, ambient corrections or warnings.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>For a not-assessable verdict, the standard's point a test would decide at, when the reason names one.</summary>
    public NormativePoint? RetestAt { get; init; }

    /// <summary>For a pass, the requirement (or requirements) the test proved, in words; null for any other verdict.</summary>
    public string? Proved { get; init; }

    /// <summary>Results outside a typical edge: never a failure, but worth a look.</summary>
    public IReadOnlyList<Advisory> Advisories { get; init; } = [];

    /// <summary>The measurement uncertainty behind the verdict and the decision rule it was given under; null when not assessed.</summary>
    public VerdictUncertainty? Uncertainty { get; init; }

    /// <summary>Whether the verdict is a failure: too early or too late.</summary>
    public bool IsFailure => Verdict is Verdict.TooEarly or Verdict.TooLate;
}
