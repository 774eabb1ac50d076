using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Domain.Verdicts;

/// <summary>The judgement of one trip test: verdict, basis, the band used, the margin and the reason in words.</summary>
/// <param name="Measurement">The test judged.</param>
/// <param name="Band">The band at the measured current.</param>
/// <param name="Verdict">Pass, too early, too late or not assessable.</param>
/// <param name="Basis">Normative point or interpolated band.</param>
/// <param name="Point">The standard's point the test matches, when the basis is normative.</param>
/// <param name="Margin">Where the measured time lies in the band.</param>
/// <param name="Reason">Plain words a technician can act on.</param>
public sealed record TripAssessment(
    TripMeasurement Measurement,
    TripBand Band,
    Verdict Verdict,
    VerdictBasis Basis,
    NormativePoint? Point,
    Margin Margin,
    string Reason)
{
    /// <summary>Remarks beside the verdict: settings found at the test, ambient corrections or warnings.</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];
}
