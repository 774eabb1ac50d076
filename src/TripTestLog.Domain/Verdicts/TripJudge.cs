using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>
/// Judges a trip test against the requirements at its measured current. Every verdict rests on a requirement: a failure
/// on one the test broke, a pass on one it proved. A failure rests only on a guaranteed edge the test can speak to: a
/// minimum it ran no hotter than (a warm start, or every pole loaded, trips sooner), or a maximum it ran at least as hot
/// as. A pass needs a requirement shown at its own current: a standard point within the lab's test-current window (or
/// beyond it on the side physics makes a fortiori), a setting's band, the relay formula in its accuracy range, or a
/// curve-table row. A test that neither breaks nor proves a requirement is not assessable, and its reason names the
/// test that would decide. A typical (drawn) edge broken raises an advisory and never decides a verdict.
/// </summary>
public static partial class TripJudge
{
    /// <summary>Judges <paramref name="measurement"/> with all poles loaded unless its pole says one.</summary>
    public static TripAssessment Assess(ITripEnvelope envelope, TripMeasurement measurement)
    {
        ArgumentNullException.ThrowIfNull(measurement);
        return Assess(envelope, measurement, new TestConditions(measurement.Start, measurement.Pole == Pole.All ? PoleLoading.AllPoles : PoleLoading.OnePole));
    }

    /// <summary>
    /// Judges <paramref name="measurement"/> against <paramref name="envelope"/> as run under <paramref name="conditions"/>.
    /// An envelope not already read through a <see cref="PointWindowEnvelope"/> is read through one at the default window.
    /// </summary>
    public static TripAssessment Assess(ITripEnvelope envelope, TripMeasurement measurement, TestConditions conditions)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(measurement);

        var windowed = envelope as PointWindowEnvelope ?? PointWindowEnvelope.Of(envelope);
        var band = windowed.At(measurement.Current);
        var applied = band.For(conditions);
        var outcome = measurement.Outcome;
        var multiple = (measurement.Current / windowed.Reference).Value;
        var aimedAt = AimedAt(windowed, multiple, conditions);
        var judged = Decide(new Case(windowed, band, applied, outcome, conditions, multiple, aimedAt));

        // The point is named only within its window: the one a failure broke, or the one a pass proved.
        var point = judged.Verdict switch
        {
            Verdict.Pass => judged.Proved.Any(p => p.Point is { } pp && pp == aimedAt) ? aimedAt : null,
            Verdict.TooEarly or Verdict.TooLate => judged.Edge is { PointLabel: { } label, Source: EdgeSource.NormativePoint }
                && windowed.Points.FirstOrDefault(p => p.Label == label) is { } broken && broken.Within(multiple, windowed.Window) ? broken : null,
            _ => aimedAt,
        };
        var margin = MarginOf(applied, outcome.Time);
        return new TripAssessment(measurement, judged.Band ?? applied, judged.Verdict, BasisOf(judged), point, margin, judged.Reason)
        {
            Notes = judged.Notes,
            Proved = judged.Verdict == Verdict.Pass ? ProvedWords(judged.Proved) : null,
            RetestAt = judged.Verdict == Verdict.NotAssessable ? aimedAt ?? Nearest(windowed, multiple, conditions, outcome.Tripped) : null,

            // An advisory qualifies a pass; on a failure or an open question it would only repeat the reason.
            Advisories = judged.Verdict == Verdict.Pass ? Advisories(applied, outcome) : [],
        };
    }

    // Normative when what decided rests on the standard's points or formula: the broken edge for a failure, the proved
    // requirements for a pass.
    private static VerdictBasis BasisOf(Judged judged)
    {
        static bool Normative(BandEdge e) => e.Source is EdgeSource.NormativePoint or EdgeSource.Characteristic;
        if (judged.Verdict == Verdict.Pass)
        {
            return judged.Proved.Any(p => p.Point is not null || Normative(p.Edge)) ? VerdictBasis.Normative : VerdictBasis.Band;
        }

        return judged.Edge is { } edge && Normative(edge) ? VerdictBasis.Normative : VerdictBasis.Band;
    }

    // The point with the test's start and loading whose window holds it, the nearest first (the first found of equals).
    private static NormativePoint? AimedAt(PointWindowEnvelope envelope, double multiple, TestConditions conditions)
    {
        NormativePoint? aimed = null;
        var nearest = double.PositiveInfinity;
        var points = envelope.Points;
        for (var i = 0; i < points.Count; i++)
        {
            var p = points[i];
            if ((p.AnyStart || p.Start == conditions.Start) && (p.Loading is null || p.Loading == conditions.Loading) && p.Within(multiple, envelope.Window)
                && Math.Abs(multiple / p.Multiple.Value - 1.0) is var off && (aimed is null || off < nearest))
            {
                (aimed, nearest) = (p, off);
            }
        }

        return aimed;
    }

    // Each requirement proved, once, in the order found; one proof (the usual case) is its own words.
    private static string ProvedWords(IReadOnlyList<Proof> proved) =>
        proved.Count == 1 ? proved[0].Requirement : string.Join("; ", proved.Select(p => p.Requirement).Distinct());

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
