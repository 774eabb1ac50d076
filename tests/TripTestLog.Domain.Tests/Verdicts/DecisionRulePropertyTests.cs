using CsCheck;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Tests.Envelopes;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>What the decision rules of ILAC-G8:09/2019 must keep everywhere: a guard band only withholds a decision.</summary>
public sealed class DecisionRulePropertyTests
{
    private static readonly Gen<TripOutcome> Outcomes =
        Gen.Select(Gen.Bool, Gen.Double[-2.5, 4.2]).Select(t => t.Item1
            ? TripOutcome.HeldFor(Seconds.Of(Math.Pow(10, t.Item2)))
            : TripOutcome.TrippedAfter(Seconds.Of(Math.Pow(10, t.Item2))));

    private static readonly Gen<ResolvedAccuracy> Accuracies =
        Gen.Select(Gen.Double[0, 2], Gen.Double[0, 0.05], Gen.Double[0, 5], Gen.Double[1, 3])
            .Select(t => InstrumentAccuracy.Of(timePercent: t.Item1, timeSeconds: t.Item2, currentPercent: t.Item3, coverageFactor: t.Item4).Over(InstrumentAccuracy.None));

    [Fact]
    public void UnderGuarded_NoFailureIsASimplePass_AndNoPassASimpleFailure()
    {
        Gen.Select(AllFamiliesPropertyTests.Any, Gen.Double[0.5, 60], AllFamiliesPropertyTests.Conditions, Outcomes, Accuracies).Sample(t =>
        {
            var (envelope, multiple, conditions, outcome, accuracy) = t;
            var m = new TripMeasurement(AssetTag.Of("P-1"), TestedAt.OnDate(new DateOnly(2025, 1, 1)), TestStage.AsFound,
                conditions.Loading == PoleLoading.AllPoles ? Pole.All : Pole.Parse("1"), CurrentMultiple.Of(multiple) * envelope.Reference, outcome,
                conditions.Start, null, "", "", "");
            var simple = TripJudge.Assess(envelope, m, conditions);

            var guarded = TripJudge.ApplyRule(simple, envelope, conditions, accuracy, DecisionRule.Guarded);
            var nonBinary = TripJudge.ApplyRule(simple, envelope, conditions, accuracy, DecisionRule.NonBinary);

            Assert.False(guarded.IsFailure && simple.Verdict == Verdict.Pass);
            Assert.False(guarded.Verdict == Verdict.Pass && simple.IsFailure);
            Assert.True(guarded.Verdict == simple.Verdict || guarded.Verdict == Verdict.NotAssessable);
            Assert.Equal(simple.Verdict, nonBinary.Verdict);
            Assert.Equal(guarded.Verdict != simple.Verdict, nonBinary.Uncertainty!.Conformity is Conformity.ConditionalPass or Conformity.ConditionalFail);
        }, iter: 3_000);
    }
}
