using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>
/// Judges a trip test against a device's envelope at the measured test current.
/// A cold release trips later than a warm one, which decides two cases: a warm test that trips before a minimum
/// set from cold proves nothing, and a cold test that runs past a maximum leaning on a warm requirement proves nothing.
/// </summary>
public static class TripJudge
{
    /// <summary>
    /// How close, relative, the measured multiple must be to one of the standard's points (with the same start condition)
    /// for the test to be judged by that point's own limits, basis normative: ±3 %. A lab policy chosen for this tool
    /// (primary-injection sets commonly hold the current to a few per cent); it is not a figure from IEC 60898-1.
    /// Outside it, the band is evaluated at the measured current, basis band.
    /// </summary>
    public const double PointTolerance = 0.03;

    /// <summary>Judges <paramref name="measurement"/> against <paramref name="envelope"/>.</summary>
    public static TripAssessment Assess(ITripEnvelope envelope, TripMeasurement measurement)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(measurement);

        var measured = envelope.At(measurement.Current);
        var point = MatchingPoint(envelope, measured.Multiple, measurement.Start);

        // Within the tolerance of one of the standard's points, the point's own limits are the requirement; elsewhere the
        // band drawn between the points is evaluated at the measured current.
        var band = point?.BandAt(measurement.Current, measured.Multiple) ?? measured;
        var basis = point is not null || IsCharacteristic(band) ? VerdictBasis.Normative : VerdictBasis.Band;
        var time = measurement.Outcome.Time;
        var margin = MarginOf(band, time);

        if (band.NoRequirement is { } why)
        {
            return new(measurement, band, Verdict.NotAssessable, basis, point, margin, why);
        }

        var (verdict, reason) = measurement.Outcome.Tripped
            ? JudgeTrip(band, time, measurement.Start)
            : JudgeHold(band, time, measurement.Start, point);
        return new(measurement, band, verdict, basis, point, margin, reason);
    }

    private static (Verdict, string) JudgeTrip(TripBand band, Seconds time, StartCondition start)
    {
        var min = band.Minimum;
        var max = band.Maximum;
        if (min.Limit is null)
        {
            return (Verdict.TooEarly, $"tripped after {time} where it must not operate at all ({min.Requirement})");
        }

        if (time < min.Limit.Value)
        {
            return start == StartCondition.Warm && min.Start == StartCondition.Cold
                ? (Verdict.NotAssessable, $"warm start: tripped after {time}, before the {min.Limit} minimum, but that limit applies from cold; repeat from cold")
                : (Verdict.TooEarly, $"tripped after {time}, before the {min.Limit} minimum ({min.Requirement})");
        }

        if (max.Limit is { } latest && time > latest)
        {
            return ColdPastWarmLimit(start, max)
                ? (Verdict.NotAssessable, $"cold start: tripped after {time}, past the {latest} maximum, but that limit assumes a warm start ({max.Requirement}); repeat straight after the 1.13 In hold")
                : (Verdict.TooLate, $"tripped after {time}, past the {latest} maximum ({max.Requirement})");
        }

        return (Verdict.Pass, $"tripped after {time}, inside {Describe(band)}");
    }

    private static (Verdict, string) JudgeHold(TripBand band, Seconds held, StartCondition start, NormativePoint? point)
    {
        var min = band.Minimum;
        var max = band.Maximum;
        if (max.Limit is { } latest && held >= latest)
        {
            return ColdPastWarmLimit(start, max)
                ? (Verdict.NotAssessable, $"cold start: held {held} without tripping, past the {latest} maximum, but that limit assumes a warm start ({max.Requirement}); repeat straight after the 1.13 In hold")
                : (Verdict.TooLate, $"held {held} without tripping; it must trip within {latest} ({max.Requirement})");
        }

        // A hold at a current proves no trip at that current or below for that long. At one of the standard's no-trip
        // points (IEC 60898-1 Table 7 a and d) that is the whole requirement.
        if (point is { MustTripWithin: null, MustHoldFor: { } required })
        {
            return held >= required
                ? (Verdict.Pass, $"held {held} without tripping, as required ({point.Requirement})")
                : (Verdict.NotAssessable, $"held only {held}; the no-trip requirement runs to {required} ({point.Requirement})");
        }

        if (min.IsOpen)
        {
            return (Verdict.NotAssessable, $"held {held} and stopped before the {max.Limit} maximum; a hold proves nothing where the release may act at once");
        }

        if (min.Limit is null)
        {
            return (Verdict.Pass, $"held {held} without operating, as required ({min.Requirement})");
        }

        var earliest = min.Limit.Value;
        if (held < earliest)
        {
            return (Verdict.NotAssessable, $"held only {held}; the no-trip requirement runs to {earliest} ({min.Requirement})");
        }

        return max.Limit is null
            ? (Verdict.Pass, $"held {held} without tripping, as required ({min.Requirement})")
            : (Verdict.NotAssessable, $"held {held} and stopped before the {max.Limit} maximum; the test shows no trip");
    }

    // A band drawn by the standard's own formula (IEC 60255-151 and IEEE C37.112 curves) is normative everywhere it is defined.
    private static bool IsCharacteristic(TripBand band) =>
        band.HasRequirement
        && (band.Minimum.Source == EdgeSource.Characteristic || band.Maximum.Source == EdgeSource.Characteristic)
        && band.Minimum.Source is EdgeSource.Characteristic or EdgeSource.None
        && band.Maximum.Source is EdgeSource.Characteristic or EdgeSource.None;

    private static bool ColdPastWarmLimit(StartCondition start, BandEdge max) =>
        start == StartCondition.Cold && max.Start == StartCondition.Warm;

    private static NormativePoint? MatchingPoint(ITripEnvelope envelope, CurrentMultiple multiple, StartCondition start) =>
        envelope.Points.FirstOrDefault(p =>
            p.Start == start && Math.Abs(multiple.Value / p.Multiple.Value - 1.0) <= PointTolerance);

    private static Margin MarginOf(TripBand band, Seconds time)
    {
        if (!band.HasRequirement || time.Value <= 0)
        {
            return new Margin(null, null, null);
        }

        var logT = Math.Log10(time.Value);
        double? toMin = band.Minimum.IsOpen || band.Minimum.Limit is null ? null : logT - Math.Log10(band.Minimum.Limit.Value.Value);
        double? toMax = band.Maximum.Limit is { } max ? Math.Log10(max.Value) - logT : null;
        double? position = toMin is { } lo && toMax is { } hi && lo + hi > 0 ? lo / (lo + hi) : null;

        return (toMin, toMax) switch
        {
            ({ } a, { } b) => a <= b ? new Margin(position, a, BandSide.Minimum) : new Margin(position, b, BandSide.Maximum),
            ({ } a, null) => new Margin(null, a, BandSide.Minimum),
            (null, { } b) => new Margin(null, b, BandSide.Maximum),
            _ => new Margin(null, null, null),
        };
    }

    private static string Describe(TripBand band) =>
        $"{band.Minimum.Limit} to {(band.Maximum.Limit is { } max ? max.ToString() : "no limit")}";
}
