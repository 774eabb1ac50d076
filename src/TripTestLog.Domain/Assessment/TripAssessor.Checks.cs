using System.Globalization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Assessment;

/// <summary>The checks that a verdict is not the test's own doing: the start, the ambient and an RCBO's residual release.</summary>
public sealed partial class TripAssessor
{
    // Judged as if the other start held; a verdict that depends on the doubtful claim is not assessable.
    private static TripAssessment? CheckStart(TripAssessment assessment, ITripEnvelope envelope, TripMeasurement? previous, TestConditions conditions)
    {
        var m = assessment.Measurement;
        if (StartCheck.Doubt(m, previous, envelope) is not { } doubt)
        {
            return null;
        }

        var other = conditions with { Start = conditions.Start == StartCondition.Cold ? StartCondition.Warm : StartCondition.Cold };
        var otherVerdict = TripJudge.Assess(envelope, m, other).Verdict;
        if (!Changes(assessment.Verdict, otherVerdict))
        {
            return null;
        }

        var claimed = conditions.Start == StartCondition.Cold ? "from cold" : "from warm";
        var unclaimed = conditions.Start == StartCondition.Cold ? "from warm" : "from cold";
        return assessment with
        {
            Verdict = Verdict.NotAssessable,
            Reason = $"{doubt}; the verdict would be {Word(assessment.Verdict)} {claimed} and {Word(otherVerdict)} {unclaimed}: "
                + $"repeat the test with the start the standard asks for ({assessment.Reason})",
        };
    }

    // Without a derating table a bimetal release may shift by up to LabPolicy.AmbientShiftPerKelvin per kelvin; a verdict
    // that the shift would change is the ambient's as much as the breaker's. An electronic unit computes its time from the
    // measured current, so the ambient does not move it.
    private TripAssessment? CheckAmbient(TripAssessment assessment, Device device, DeviceSettings settings, bool thermal, TestConditions conditions)
    {
        var m = assessment.Measurement;
        var reference = device.ReferenceAmbient ?? EnvelopeFactory.DefaultReferenceAmbient(device.Family);
        if (!thermal || settings is ElectronicTripSettings or RelaySettings || device.AmbientTable is not null || m.Ambient is not { } ambient || reference is not { } r)
        {
            return null;
        }

        var delta = ambient.Value - r.Value;
        if (Math.Abs(delta) <= LabPolicy.AmbientCheckKelvin)
        {
            return null;
        }

        // Warmer than the reference, the release acts at a lower current: its thresholds scale by (1 - k dT). dT is
        // rounded away from zero to whole half kelvins: a slightly larger shift (stricter), and few distinct envelopes.
        var rounded = Math.Sign(delta) * Math.Ceiling(Math.Abs(delta) * 2) / 2;
        var factor = Math.Clamp(1 - LabPolicy.AmbientShiftPerKelvin * rounded, 0.5, 1.5);
        var shifted = TripJudge.Assess(Envelope(device, settings, factor), m, conditions).Verdict;
        var k = (LabPolicy.AmbientShiftPerKelvin * 100).ToString("0.#", CultureInfo.InvariantCulture);
        if (!Changes(assessment.Verdict, shifted))
        {
            return Math.Abs(delta) <= ambientNoteKelvin ? null : assessment with
            {
                Notes = [.. assessment.Notes, $"ambient {ambient} is {Math.Abs(delta):0.#} K from the {r} reference and the device has no derating table; "
                    + $"the verdict holds with a shift of up to {k} % of current per K"],
            };
        }

        return assessment with
        {
            Verdict = Verdict.NotAssessable,
            Reason = $"ambient {ambient} is {Math.Abs(delta):0.#} K {(delta > 0 ? "above" : "below")} the {r} reference and the device has no derating table; "
                + $"a thermal release may shift by up to {k} % of current per K (from memory), and with that shift this test would be {Word(shifted)} "
                + $"rather than {Word(assessment.Verdict)}: repeat nearer {r} or register the maker's derating table ({assessment.Reason})",
        };
    }

    // Current through one pole of an RCBO alone does not return through the others: it is a residual current, and the
    // residual-current release trips within tens of milliseconds, long before any overcurrent release.
    private static TripAssessment? CheckResidual(TripAssessment assessment, Device device, TestConditions conditions)
    {
        var outcome = assessment.Measurement.Outcome;
        if (device.Family != DeviceFamily.Iec61009 || conditions.Loading != PoleLoading.OnePole || !outcome.Tripped)
        {
            return null;
        }

        if (assessment.Verdict != Verdict.TooEarly && !(assessment.Verdict == Verdict.Pass && outcome.Time <= LabPolicy.ResidualBreakTime))
        {
            return null;
        }

        return assessment with
        {
            Verdict = Verdict.NotAssessable,
            Reason = $"tripped after {outcome.Time} with one pole of an RCBO loaded: that current is a residual current, and the residual-current "
                + $"release trips within {LabPolicy.ResidualBreakTime} (IEC 61009-1, from memory), so this says nothing of the overcurrent release; "
                + "inject through line and neutral in series so no residual current flows, or as the maker directs",
        };
    }
}
