using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>
/// Judges a trip test against the requirements at its measured current. A failure rests only on a guaranteed edge that
/// the test can speak to: a minimum it ran no hotter than (a warm start, or every pole loaded, trips sooner), or a
/// maximum it ran at least as hot as. A guaranteed edge broken by a test run under other conditions makes the verdict
/// not assessable, with the reason; a typical (drawn) edge broken raises an advisory and never a failure.
/// </summary>
public static partial class TripJudge
{
    /// <summary>
    /// How close, relative, the measured multiple must be to one of the standard's points for the test to be named as
    /// aimed at it: ±3 %. It only names the point (for findings and reports); it never decides a verdict, which follows
    /// each point's limit in the direction physics gives it. A lab policy of this tool, not a figure from a standard.
    /// </summary>
    public const double PointTolerance = 0.03;

    /// <summary>Judges <paramref name="measurement"/> with all poles loaded unless its pole says one.</summary>
    public static TripAssessment Assess(ITripEnvelope envelope, TripMeasurement measurement)
    {
        ArgumentNullException.ThrowIfNull(measurement);
        return Assess(envelope, measurement, new TestConditions(measurement.Start, measurement.Pole == Pole.All ? PoleLoading.AllPoles : PoleLoading.OnePole));
    }

    /// <summary>Judges <paramref name="measurement"/> against <paramref name="envelope"/> as run under <paramref name="conditions"/>.</summary>
    public static TripAssessment Assess(ITripEnvelope envelope, TripMeasurement measurement, TestConditions conditions)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(measurement);

        var band = envelope.At(measurement.Current);
        var applied = band.For(conditions);
        var outcome = measurement.Outcome;
        var margin = MarginOf(applied, outcome.Time);
        var advisories = Advisories(applied, outcome);
        var aimedAt = AimedAt(envelope, applied.Multiple, conditions);
        var judged = band.HasRequirement
            ? Decide(band, applied, outcome, conditions, envelope, measurement.Current)
            : new Judged(Verdict.NotAssessable, band.NoRequirement!, null, []);

        // A failure names the point it broke; otherwise the point the test was aimed at names it, for findings and reports.
        var edgePoint = judged.Edge?.PointLabel is { } label ? envelope.Points.FirstOrDefault(p => p.Label == label) : null;
        var point = judged.Verdict is Verdict.TooEarly or Verdict.TooLate ? edgePoint ?? aimedAt : aimedAt ?? edgePoint;
        return new TripAssessment(measurement, applied, judged.Verdict, BasisOf(judged, applied), point, margin, judged.Reason)
        {
            Notes = judged.Notes,

            // An advisory qualifies a pass; on a failure or an open question it would only repeat the reason.
            Advisories = judged.Verdict == Verdict.Pass ? advisories : [],
        };
    }

    // Normative when what decided rests on the standard's points or formula: the broken edge for a failure, every closed
    // edge of the band for a pass (or the edge it met where the band is open on both sides).
    private static VerdictBasis BasisOf(Judged judged, AppliedBand applied)
    {
        static bool Normative(BandEdge e) => e.Source is EdgeSource.NormativePoint or EdgeSource.Characteristic;
        if (judged.Verdict == Verdict.Pass)
        {
            var closed = new[] { applied.Minimum, applied.Maximum }.Where(e => !e.IsOpen && e.Source != EdgeSource.None).ToList();
            if (closed.Count > 0)
            {
                return closed.All(Normative) ? VerdictBasis.Normative : VerdictBasis.Band;
            }
        }

        return judged.Edge is { } edge && Normative(edge) ? VerdictBasis.Normative : VerdictBasis.Band;
    }

    private static NormativePoint? AimedAt(ITripEnvelope envelope, CurrentMultiple multiple, TestConditions conditions) =>
        envelope.Points
            .Where(p => p.Start == conditions.Start && (p.Loading is null || p.Loading == conditions.Loading))
            .Where(p => Math.Abs(multiple.Value / p.Multiple.Value - 1.0) <= PointTolerance)
            .OrderBy(p => Math.Abs(multiple.Value / p.Multiple.Value - 1.0))
            .FirstOrDefault();

    private static IReadOnlyList<Advisory> Advisories(AppliedBand band, TripOutcome outcome)
    {
        var list = new List<Advisory>();
        var t = outcome.Time;
        if (outcome.Tripped && band.TypicalMinimum is { } lo && lo.TripIsBefore(t))
        {
            list.Add(new Advisory(BandSide.Minimum, lo, $"tripped after {t}, earlier than the typical {lo.Limit} ({lo.Requirement}); a drawn line, not a requirement: compare with the maker's curve"));
        }

        if (band.TypicalMaximum is { Limit: { } hi } up && (outcome.Tripped ? up.TripIsAfter(t) : t >= hi))
        {
            var what = outcome.Tripped ? $"tripped after {t}" : $"held {t}";
            list.Add(new Advisory(BandSide.Maximum, up, $"{what}, later than the typical {hi} ({up.Requirement}); a drawn line, not a requirement: compare with the maker's curve"));
        }

        return list;
    }

    private static Margin MarginOf(AppliedBand band, Seconds time)
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
}
