using CsCheck;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Tests.Envelopes;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>What must hold for every family, every current, start, loading and result.</summary>
public sealed class VerdictPropertyTests
{
    private static readonly Gen<TripOutcome> Outcomes =
        Gen.Select(Gen.Bool, Gen.Double[-2.5, 4.2]).Select(t => t.Item1
            ? TripOutcome.HeldFor(Seconds.Of(Math.Pow(10, t.Item2)))
            : TripOutcome.TrippedAfter(Seconds.Of(Math.Pow(10, t.Item2))));

    private static TripMeasurement Test(ITripEnvelope envelope, double multiple, TripOutcome outcome, TestConditions c) =>
        new(AssetTag.Of("P-1"), TestedAt.OnDate(new DateOnly(2025, 1, 1)), TestStage.AsFound,
            c.Loading == PoleLoading.AllPoles ? Pole.All : Pole.Parse("1"), CurrentMultiple.Of(multiple) * envelope.Reference, outcome,
            c.Start, null, "", "", "");

    [Fact]
    public void TheBandCheckUses_IsTheBandEnvelopePrints()
    {
        // `envelope` prints envelope.At(current).For(conditions) (EnvelopeWriter.BandAt); check must judge by exactly that.
        Gen.Select(AllFamiliesPropertyTests.Any, Gen.Double[0.5, 60], AllFamiliesPropertyTests.Conditions, Outcomes).Sample(t =>
        {
            var (envelope, m, conditions, outcome) = t;
            var test = Test(envelope, m, outcome, conditions);

            var assessment = TripJudge.Assess(envelope, test, conditions);
            var printed = PointWindowEnvelope.Of(envelope).At(test.Current).For(conditions);

            // The band differs only where the verdict cites a limit for other conditions, and then by that one edge.
            if (assessment.Band != printed)
            {
                Assert.Equal(Verdict.NotAssessable, assessment.Verdict);
                Assert.Contains("assumes", assessment.Reason);
                Assert.True(assessment.Band == printed with { Minimum = assessment.Band.Minimum } || assessment.Band == printed with { Maximum = assessment.Band.Maximum });
            }
        }, iter: 5_000);
    }

    [Fact]
    public void NoResultFailsOnATypicalEdgeAlone()
    {
        // The same test judged with every typical edge removed gets the same verdict: typical edges only advise.
        Gen.Select(AllFamiliesPropertyTests.Any, Gen.Double[0.5, 60], AllFamiliesPropertyTests.Conditions, Outcomes).Sample(t =>
        {
            var (envelope, m, conditions, outcome) = t;
            var test = Test(envelope, m, outcome, conditions);

            var full = TripJudge.Assess(envelope, test, conditions);
            var guaranteedOnly = TripJudge.Assess(new GuaranteedOnly(envelope), test, conditions);

            Assert.Equal(guaranteedOnly.Verdict, full.Verdict);
            if (full.IsFailure)
            {
                var edge = full.Verdict == Verdict.TooEarly ? full.Band.Minimum : full.Band.Maximum;
                Assert.Equal(EdgeStrength.Guaranteed, edge.Strength);
            }
        }, iter: 5_000);
    }

    [Fact]
    public void AFailureNeedsConditionsAtLeastAsSevereAsTheRequirementAssumes()
    {
        // A too-early needs a test no hotter than the broken minimum assumes; a too-late one at least as hot.
        Gen.Select(AllFamiliesPropertyTests.Any, Gen.Double[0.5, 60], AllFamiliesPropertyTests.Conditions, Outcomes).Sample(t =>
        {
            var (envelope, m, conditions, outcome) = t;
            var a = TripJudge.Assess(envelope, Test(envelope, m, outcome, conditions), conditions);

            if (a.Verdict == Verdict.TooEarly)
            {
                Assert.True(a.Band.Minimum.TestAtMostAsHot(conditions));
            }

            if (a.Verdict == Verdict.TooLate)
            {
                Assert.True(a.Band.Maximum.TestAtLeastAsHot(conditions));
            }
        }, iter: 5_000);
    }

    [Fact]
    public void EveryPass_NamesTheRequirementItProved()
    {
        Gen.Select(AllFamiliesPropertyTests.Any, Gen.Double[0.5, 60], AllFamiliesPropertyTests.Conditions, Outcomes).Sample(t =>
        {
            var (envelope, m, conditions, outcome) = t;
            var a = TripJudge.Assess(envelope, Test(envelope, m, outcome, conditions), conditions);

            Assert.Equal(a.Verdict == Verdict.Pass, !string.IsNullOrEmpty(a.Proved));
            if (a.Point is { } p)
            {
                Assert.True(p.Within(m, LabPolicy.PointWindow), $"{p.Label} named at {m}");
            }
        }, iter: 5_000);
    }

    [Fact]
    public void TheCurrentOffsetAlone_NeverFailsATripThePointPasses_NorPassesOneFarPastTheMovedLimit()
    {
        // A trip at a trip-by point's own current that passes is never too late a little off it; one past the limit moved
        // for the largest offset in the window is never a pass there. Holds: one that passes at a no-trip point passes
        // anywhere at or above it within the window.
        Gen.Select(AllFamiliesPropertyTests.Any, Gen.Double[-1, 1], Gen.Double[-2.5, 4.2]).Sample(t =>
        {
            var (envelope, frac, logT) = t;
            foreach (var p in envelope.Points)
            {
                var c = new TestConditions(p.AnyStart ? StartCondition.Cold : p.Start, p.Loading ?? PoleLoading.AllPoles);
                var m = p.Multiple.Value * (1 + (frac * LabPolicy.PointWindow));
                var trip = TripOutcome.TrippedAfter(Seconds.Of(Math.Pow(10, logT)));
                var atPoint = TripJudge.Assess(envelope, Test(envelope, p.Multiple.Value, trip, c), c);
                var off = TripJudge.Assess(envelope, Test(envelope, m, trip, c), c);
                if (p.MustTripWithin is { } limit && atPoint.Verdict == Verdict.Pass && off.Verdict == Verdict.TooLate)
                {
                    // The offset alone never fails it: a failure there rests on another requirement at that current (a
                    // maker's curve falling steeply past the point), never on the point's own limit.
                    Assert.NotEqual(p.Label, off.Band.Maximum.PointLabel);
                    Assert.True(off.Band.Maximum.Limit!.Value.Value < limit.Value, $"{off.Band.Maximum.Requirement} at {m}");
                }

                var widest = OffsetBound.Stretch(p.Multiple.Value * (1 - LabPolicy.PointWindow), p.Multiple.Value, p.HighestUltimate);
                if (p.MustTripWithin is { } lim && !double.IsInfinity(widest) && trip.Time.Value > lim.Value * widest * 1.0001)
                {
                    Assert.Equal(Verdict.TooLate, off.Verdict);
                }

                if (p.IsNoTripPoint && frac >= 0)
                {
                    var hold = TripOutcome.HeldFor(p.MustHoldFor!.Value);
                    var heldAt = TripJudge.Assess(envelope, Test(envelope, p.Multiple.Value, hold, c), c).Verdict;
                    var heldOff = TripJudge.Assess(envelope, Test(envelope, m, hold, c), c).Verdict;
                    Assert.True(heldAt != Verdict.Pass || heldOff == Verdict.Pass, $"{p.Label}: {heldAt} at the point, {heldOff} at {m}");
                }
            }
        }, iter: 2_000);
    }

    private sealed class GuaranteedOnly(ITripEnvelope inner) : ITripEnvelope
    {
        public string Standard => inner.Standard;

        public string ReferenceName => inner.ReferenceName;

        public Amperes Reference => inner.Reference;

        public IReadOnlyList<NormativePoint> Points => inner.Points;

        public bool IsThermal(Amperes current) => inner.IsThermal(current);

        public TripBand At(Amperes current)
        {
            var band = inner.At(current);
            return band with
            {
                Minimums = band.Minimums.Where(e => e.Strength == EdgeStrength.Guaranteed).ToList(),
                Maximums = band.Maximums.Where(e => e.Strength == EdgeStrength.Guaranteed).ToList(),
            };
        }
    }
}
