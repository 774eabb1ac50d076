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
            Proved = null,
            Reason = $"{doubt}; the verdict would be {Word(assessment.Verdict)} {claimed} and {Word(otherVerdict)} {unclaimed}: "
                + $"repeat the test with the start the standard asks for ({assessment.Reason})",
        };
    }

    // A curve table has no standard points to move, so for a device judged by a curve table alone the ambient is checked
    // the older way: judged again with the table's currents shifted as far as the ambient can move them; a verdict that
    // the shift would change is the ambient's as much as the breaker's.
    private TripAssessment? CheckCurveTableAmbient(TripAssessment assessment, Device device, DeviceSettings settings, bool thermal, ITripEnvelope envelope, TestConditions conditions)
    {
        var m = assessment.Measurement;
        if (!thermal || envelope.Points.Count > 0 || AmbientDelta(device, settings, m) is not { } d || Math.Abs(d.Kelvin) <= LabPolicy.AmbientCheckKelvin)
        {
            return null;
        }

        var rounded = Math.Sign(d.Kelvin) * Math.Ceiling(Math.Abs(d.Kelvin) * 2) / 2;
        var factor = Math.Clamp(1 - LabPolicy.AmbientShiftPerKelvin * rounded, 0.5, 1.5);
        var shifted = TripJudge.Assess(Envelope(device, settings, factor, AmbientShift.None), m, conditions).Verdict;
        if (!Changes(assessment.Verdict, shifted))
        {
            return null;
        }

        var k = (LabPolicy.AmbientShiftPerKelvin * 100).ToString("0.#", CultureInfo.InvariantCulture);
        return assessment with
        {
            Verdict = Verdict.NotAssessable,
            Proved = null,
            Reason = $"ambient {d.Ambient} is {Math.Abs(d.Kelvin):0.#} K {(d.Kelvin > 0 ? "above" : "below")} the {d.Reference} reference and the device has no derating table; "
                + $"a thermal release may shift by up to {k} % of current per K (from memory), and with that shift its curve table would judge this test {Word(shifted)} "
                + $"rather than {Word(assessment.Verdict)}: repeat nearer {d.Reference} or register the maker's derating table ({assessment.Reason})",
        };
    }

    // Current through one pole of an RCBO alone does not return through the others: it is a residual current, and the
    // residual-current release trips within tens of milliseconds, long before any overcurrent release.
    private static TripAssessment? CheckResidual(TripAssessment assessment, Device device, TestConditions conditions)
    {
        var outcome = assessment.Measurement.Outcome;
        if (device.Family != DeviceFamily.Iec61009 || conditions.Loading != PoleLoading.OnePole)
        {
            return null;
        }

        if (assessment.Verdict != Verdict.TooEarly && !(assessment.Verdict == Verdict.Pass && outcome.Time <= LabPolicy.ResidualBreakTime))
        {
            // Slower than the residual release: either no residual current flowed (line and neutral in series) or that
            // release did not act, which a one-pole overcurrent verdict cannot tell apart.
            return outcome.Time <= LabPolicy.ResidualBreakTime ? null : assessment with
            {
                Notes = [.. assessment.Notes, $"one pole of an RCBO carried {assessment.Measurement.Current} for {outcome.Time} without the residual-current release "
                    + $"acting (it should within {LabPolicy.ResidualBreakTime} if the current flowed through that pole alone): confirm the injection was through line and neutral "
                    + "in series, or test the residual-current release"],
            };
        }

        return assessment with
        {
            Verdict = Verdict.NotAssessable,
            Proved = null,
            Reason = $"tripped after {outcome.Time} with one pole of an RCBO loaded: that current is a residual current, and the residual-current "
                + $"release trips within {LabPolicy.ResidualBreakTime} (IEC 61009-1, from memory), so this says nothing of the overcurrent release; "
                + "inject through line and neutral in series so no residual current flows, or as the maker directs",
        };
    }
}
