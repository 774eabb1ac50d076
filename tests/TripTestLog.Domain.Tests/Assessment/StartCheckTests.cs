using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Assessment;

/// <summary>
/// Warm and cold are claims the records can check. IEC 60898-1 Table 7 row b is "immediately after" row a's 1 h hold;
/// a cold start needs a rested release. The gaps (warm within 10 min of the hold's end, cold after 30 min of rest from
/// any test of 1 s or more) are this tool's lab policy. A doubtful claim changes a verdict only when the verdict
/// depends on it.
/// </summary>
public sealed class StartCheckTests
{
    private static readonly DeviceHistory C16 = new([new Device(AssetTag.Of("M-2"), "S", "L", DeviceFamily.Iec60898, Amperes.Of(16), 1,
        Volts.Of(230), null, null, "", "", "", new Iec60898Settings(TripCurve.C))]);

    private static TripMeasurement Test(string at, double amps, TripOutcome outcome, StartCondition start) =>
        new(AssetTag.Of("M-2"), TestedAt.Parse(at), TestStage.AsFound, Pole.All, Amperes.Of(amps), outcome, start, null, "", "", "");

    private static TripAssessment Judge(TripMeasurement test, TripMeasurement? previous) =>
        new TripAssessor(new Dictionary<string, CurveTable>(), new Dictionary<string, AmbientTable>()).Assess(C16, test, previous).Assessment;

    private static readonly TripMeasurement HoldAtA = Test("2026-03-06T08:00", 18.2, TripOutcome.HeldFor(Seconds.Of(3600)), StartCondition.Cold);

    private static readonly TripMeasurement SlowWarmHold = Test("2026-03-06T09:02", 23.3, TripOutcome.HeldFor(Seconds.Of(3600)), StartCondition.Warm);

    [Fact]
    public void AWarmHoldStraightAfterRowA_IsJudgedByRowB()
    {
        Assert.Equal(Verdict.TooLate, Judge(SlowWarmHold, HoldAtA).Verdict);
    }

    [Fact]
    public void AWarmHoldWithNoRowAHoldBeforeIt_IsNotAssessable()
    {
        var afterATrip = Test("2026-03-06T08:00", 18.2, TripOutcome.TrippedAfter(Seconds.Of(1200)), StartCondition.Cold);

        var none = Judge(SlowWarmHold, null);
        var wrong = Judge(SlowWarmHold, afterATrip);

        Assert.Equal(Verdict.NotAssessable, none.Verdict);
        Assert.Contains("no test of this device comes before it", none.Reason);
        Assert.Equal(Verdict.NotAssessable, wrong.Verdict);
        Assert.Contains("2026-03-06T08:00:00", wrong.Reason);
    }

    [Fact]
    public void AWarmTestLongAfterTheHold_IsNotAssessable()
    {
        var late = SlowWarmHold with { TestedAt = TestedAt.Parse("2026-03-06T10:30") };

        var a = Judge(late, HoldAtA);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("90 min", a.Reason);
    }

    [Fact]
    public void AColdTestMinutesAfterALongTest_IsNotAssessable_WhenTheVerdictDependsOnIt()
    {
        // A "cold" trip at 2.55 In after 0.9 s, 5 min after a 20 s test ended: too early from cold, but a warm release
        // trips sooner, so the failure may be the leftover heat.
        var before = Test("2026-03-06T11:00", 40.8, TripOutcome.TrippedAfter(Seconds.Of(20)), StartCondition.Cold);
        var test = Test("2026-03-06T11:05:20", 40.8, TripOutcome.TrippedAfter(Seconds.Of(0.9)), StartCondition.Cold);
        var rested = test with { TestedAt = TestedAt.Parse("2026-03-06T12:00") };

        var a = Judge(test, before);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("marked cold", a.Reason);
        Assert.Contains("2026-03-06T11:00:00", a.Reason);
        Assert.Equal(Verdict.TooEarly, Judge(rested, before).Verdict);
    }

    [Fact]
    public void ADoubtfulStart_KeepsAVerdictThatHoldsEitherWay()
    {
        // A hold at row d, 10 min after a thermal trip: a warm release held too, so the pass does not depend on the claim.
        var before = Test("2026-03-06T11:00", 40.8, TripOutcome.TrippedAfter(Seconds.Of(20)), StartCondition.Cold);
        var hold = Test("2026-03-06T11:11", 80.5, TripOutcome.HeldFor(Seconds.Of(0.2)), StartCondition.Cold);

        Assert.Equal(Verdict.Pass, Judge(hold, before).Verdict);
    }
}
