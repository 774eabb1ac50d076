using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Domain.Measurements;
using static TripTestLog.Domain.Tests.Verdicts.TripJudgeTests;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// One pole of a multipole miniature breaker loaded alone. IEC 60898-1 9.10.3 (from memory of the clause number):
/// from cold, trip within the conventional time at 1.1 x 1.45 In for two poles, 1.2 x 1.45 In for three or four.
/// Rows a to c assume every pole loaded; one pole alone heats the release less and trips later, so their minimums still
/// hold and their maximums prove nothing. Each pole has its own magnetic release, so rows d and e hold per pole.
/// </summary>
public sealed class SinglePoleTests
{
    [Fact]
    public void AOnePoleHoldAt145In_IsNotAFailure()
    {
        var a = Judge(TripCurve.C, 25, 36.25, Held(3600), StartCondition.Warm, poles: 3, pole: "1");

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("all poles loaded", a.Reason);
    }

    [Theory]
    [InlineData(3, 1.74, 3600, Verdict.TooLate)]   // 1.2 x 1.45 = 1.74 In
    [InlineData(3, 1.73, 3600, Verdict.NotAssessable)]
    [InlineData(2, 1.595, 3600, Verdict.TooLate)]  // 1.1 x 1.45 = 1.595 In
    [InlineData(2, 1.60, 3599, Verdict.NotAssessable)]
    public void AOnePoleHold_IsJudgedByTheSinglePolePoint(int poles, double multiple, double heldSeconds, Verdict expected)
    {
        var a = Judge(TripCurve.C, 20, 20 * multiple, Held(heldSeconds), StartCondition.Cold, poles, pole: "2");

        Assert.Equal(expected, a.Verdict);
    }

    [Fact]
    public void AOnePoleTripBeforeRowA_IsStillTooEarly()
    {
        // One pole trips later than all poles, so row a's minimum binds it a fortiori.
        Assert.Equal(Verdict.TooEarly, Judge(TripCurve.C, 20, 22.6, Tripped(1800), StartCondition.Cold, poles: 3, pole: "1").Verdict);
    }

    [Theory]
    [InlineData(5.0, true, 0.2, Verdict.Pass)]      // row d per pole
    [InlineData(4.9, false, 0.05, Verdict.TooEarly)]
    [InlineData(10.0, false, 0.05, Verdict.Pass)]   // row e per pole
    [InlineData(10.0, true, 0.2, Verdict.TooLate)]
    public void TheInstantaneousRows_HoldPerPole(double multiple, bool held, double seconds, Verdict expected)
    {
        var outcome = held ? Held(seconds) : Tripped(seconds);

        Assert.Equal(expected, Judge(TripCurve.C, 20, 20 * multiple, outcome, StartCondition.Cold, poles: 3, pole: "3").Verdict);
    }

    [Fact]
    public void PoleOneOfASinglePoleBreaker_IsTheWholeBreaker()
    {
        Assert.Equal(Verdict.TooLate, Judge(TripCurve.C, 20, 29, Held(3600), StartCondition.Warm, poles: 1, pole: "1").Verdict);
    }
}
