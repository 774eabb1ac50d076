using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Check;

/// <summary>The findings one judged trip test raises on its own.</summary>
internal static class TripFindings
{
    public static IReadOnlyList<Finding> Of(StoredTrip trip, TripAssessment assessment, UntracedInstrument? untraced)
    {
        if (!assessment.IsFailure && untraced is null)
        {
            return [];
        }

        var m = trip.Measurement;
        var source = new RecordSource(trip.SourceFile, trip.SourceLine);
        var findings = new List<Finding>(2);
        if (assessment.IsFailure)
        {
            var edge = assessment.Verdict == Verdict.TooEarly ? assessment.Band.Minimum : assessment.Band.Maximum;
            findings.Add(new Finding(FindingKind.TripOutOfBand, assessment.Verdict == Verdict.TooLate ? Severity.OutOfService : Severity.Act, m.Tag, m.TestedAt, new TripFacts.OutOfBand(edge.Requirement, assessment.Reason), [source]));
        }

        if (untraced is not null)
        {
            findings.Add(new Finding(untraced.Registered ? FindingKind.CalibrationLapsed : FindingKind.InstrumentUnregistered, Severity.Investigate,
                m.Tag, m.TestedAt, new InstrumentFacts.Untraced(untraced), [source])
            {
                Instrument = m.Instrument,
            });
        }

        return findings;
    }
}
