using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// Verdicts against IEC 60898-1:2015 Table 7 (rows a-e) and Table 2 (instantaneous ranges). Each case names the row it
/// rests on; cases between the rows test this tool's documented band and start-condition rules.
/// </summary>
public sealed class TripJudgeTests
{
    private static TripAssessment Judge(TripCurve curve, double rated, double currentA, TripOutcome outcome, StartCondition start)
    {
        var envelope = new Iec60898Envelope(curve, Amperes.Of(rated));
        var measurement = new TripMeasurement(
            AssetTag.Of("T-1"), TestedAt.OnDate(new DateOnly(2024, 3, 18)), TestStage.AsFound, Pole.All,
            Amperes.Of(currentA), outcome, start, null, "", "", "");
        return TripJudge.Assess(envelope, measurement);
    }

    private static TripOutcome Tripped(double s) => TripOutcome.TrippedAfter(Seconds.Of(s));

    private static TripOutcome Held(double s) => TripOutcome.HeldFor(Seconds.Of(s));

    [Theory]
    // Row c: 1 s < t < 60 s for In <= 32 A, < 120 s above.
    [InlineData(16, 61, Verdict.TooLate)]
    [InlineData(32, 100, Verdict.TooLate)]
    [InlineData(40, 100, Verdict.Pass)]
    [InlineData(40, 121, Verdict.TooLate)]
    [InlineData(16, 0.9, Verdict.TooEarly)]
    [InlineData(16, 30, Verdict.Pass)]
    public void TripAt255In_IsJudgedByRowC_OnBothSidesOfThe32ASplit(double rated, double tripSeconds, Verdict expected)
    {
        var a = Judge(TripCurve.C, rated, rated * 2.55, Tripped(tripSeconds), StartCondition.Cold);

        Assert.Equal(expected, a.Verdict);
        Assert.Equal(VerdictBasis.Normative, a.Basis);
        Assert.Equal("c", a.Point!.Label);
    }

    [Theory]
    // Row b: 1.45 In straight after a (warm), trip within 1 h up to 63 A, 2 h above.
    [InlineData(63, 3600, Verdict.TooLate)]
    [InlineData(80, 3600, Verdict.NotAssessable)]
    [InlineData(80, 7200, Verdict.TooLate)]
    public void WarmHoldAt145In_IsTooLateOnlyOnceTheConventionalTimeHasRun(double rated, double heldSeconds, Verdict expected)
    {
        var a = Judge(TripCurve.C, rated, rated * 1.45, Held(heldSeconds), StartCondition.Warm);

        Assert.Equal(expected, a.Verdict);
    }

    [Fact]
    public void WarmTripAt145In_WithinTheHour_Passes_WhateverHowSoon()
    {
        // Row b sets only a trip-by limit.
        Assert.Equal(Verdict.Pass, Judge(TripCurve.B, 20, 29, Tripped(90), StartCondition.Warm).Verdict);
    }

    [Theory]
    // Row a: 1.13 In from cold, no trip within 1 h (In <= 63 A) or 2 h (In > 63 A).
    [InlineData(16, 3600, Verdict.Pass)]
    [InlineData(16, 1800, Verdict.NotAssessable)]
    [InlineData(63, 3600, Verdict.Pass)]
    [InlineData(80, 3600, Verdict.NotAssessable)]
    [InlineData(80, 7200, Verdict.Pass)]
    public void ColdHoldAt113In_PassesOnlyForTheFullConventionalTime(double rated, double heldSeconds, Verdict expected)
    {
        var a = Judge(TripCurve.C, rated, rated * 1.13, Held(heldSeconds), StartCondition.Cold);

        Assert.Equal(expected, a.Verdict);
        Assert.Equal("a", a.Point!.Label);
    }

    [Fact]
    public void ColdTripAt113In_WithinTheHour_IsTooEarly()
    {
        Assert.Equal(Verdict.TooEarly, Judge(TripCurve.C, 16, 18.08, Tripped(1800), StartCondition.Cold).Verdict);
    }

    [Theory]
    // Row d: lower instantaneous limit, no trip within 0.1 s (B 3 In, C 5 In, D 10 In).
    [InlineData(TripCurve.B, 3, 0.05, Verdict.TooEarly)]
    [InlineData(TripCurve.C, 5, 0.08, Verdict.TooEarly)]
    [InlineData(TripCurve.D, 10, 0.2, Verdict.Pass)]
    public void TripAtTheLowerInstantaneousLimit_IsJudgedByRowD(TripCurve curve, double multiple, double tripSeconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(curve, 16, 16 * multiple, Tripped(tripSeconds), StartCondition.Cold).Verdict);
    }

    [Fact]
    public void HoldOfOneTenthSecondAtRowD_Passes()
    {
        var a = Judge(TripCurve.C, 16, 80, Held(0.2), StartCondition.Cold);

        Assert.Equal(Verdict.Pass, a.Verdict);
        Assert.Equal("d", a.Point!.Label);
    }

    [Theory]
    // Row e: upper instantaneous limit, trip within 0.1 s (B 5 In, C 10 In, D 20 In).
    [InlineData(TripCurve.B, 5, 0.12, Verdict.TooLate)]
    [InlineData(TripCurve.C, 10, 0.012, Verdict.Pass)]
    [InlineData(TripCurve.D, 20, 0.101, Verdict.TooLate)]
    public void TripAtTheUpperInstantaneousLimit_IsJudgedByRowE(TripCurve curve, double multiple, double tripSeconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(curve, 10, 10 * multiple, Tripped(tripSeconds), StartCondition.Cold).Verdict);
    }

    [Fact]
    public void HoldAtTheUpperInstantaneousLimit_IsTooLate()
    {
        Assert.Equal(Verdict.TooLate, Judge(TripCurve.C, 16, 160, Held(0.2), StartCondition.Cold).Verdict);
    }

    [Fact]
    public void ColdHoldAt145In_IsNotAssessable_BecauseRowBStartsWarm()
    {
        var a = Judge(TripCurve.C, 16, 23.2, Held(3600), StartCondition.Cold);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("warm", a.Reason);
    }

    [Fact]
    public void WarmTripBeforeAColdMinimum_IsNotAssessable()
    {
        // Row c's 1 s minimum is from cold; a warm release trips sooner, so 0.5 s proves nothing.
        var a = Judge(TripCurve.C, 16, 40.8, Tripped(0.5), StartCondition.Warm);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Equal(VerdictBasis.Band, a.Basis);
    }

    [Fact]
    public void Below113In_IsNotAssessable()
    {
        var a = Judge(TripCurve.C, 16, 16.8, Held(3600), StartCondition.Cold);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("1.13 In", a.Reason);
    }

    [Fact]
    public void HoldStoppedBeforeTheTripByLimitOfRowC_IsNotAssessable()
    {
        Assert.Equal(Verdict.NotAssessable, Judge(TripCurve.C, 16, 40.8, Held(30), StartCondition.Cold).Verdict);
    }

    [Fact]
    public void TheMeasuredCurrentDecides_NotTheNominalPoint()
    {
        // Both tests were meant as 1.45 In on a 16 A breaker. 23.2 A is within 3 % of row b; 22.4 A (1.40 In) is not,
        // and below 1.45 In the standard requires no trip at all.
        var near = Judge(TripCurve.C, 16, 23.2, Held(3600), StartCondition.Warm);
        var low = Judge(TripCurve.C, 16, 22.4, Held(3600), StartCondition.Warm);

        Assert.Equal((Verdict.TooLate, VerdictBasis.Normative), (near.Verdict, near.Basis));
        Assert.Equal((Verdict.Pass, VerdictBasis.Band), (low.Verdict, low.Basis));
        Assert.Equal(1.40, low.Band.Multiple.Value, 1e-9);
    }

    [Theory]
    // Between the rows (basis band), this tool's documented edges apply.
    [InlineData(16, 2.0, 5, Verdict.TooEarly)]        // minimum 11.5 s on the line through rows a and c
    [InlineData(16, 2.0, 60, Verdict.Pass)]
    [InlineData(16, 2.0, 400, Verdict.NotAssessable)] // past the line through b (warm) and c: no cold limit
    [InlineData(16, 4.0, 30, Verdict.TooLate)]        // maximum 24.4 s by I²t from row c, a cold limit
    public void BetweenTheRows_TheBandIsUsed(double rated, double multiple, double tripSeconds, Verdict expected)
    {
        var a = Judge(TripCurve.C, rated, rated * multiple, Tripped(tripSeconds), StartCondition.Cold);

        Assert.Equal(expected, a.Verdict);
        Assert.Equal(VerdictBasis.Band, a.Basis);
    }

    [Fact]
    public void Margin_IsThePositionInLogTimeAndTheDecadesToTheNearerEdge()
    {
        // Row c band for 16 A: 1 s to 60 s. By hand: log10(6) / log10(60) = 0.4376; nearer edge is the minimum, 0.778 decades away.
        var a = Judge(TripCurve.C, 16, 40.8, Tripped(6), StartCondition.Cold);

        Assert.Equal(0.4376, a.Margin.PositionInBand!.Value, 1e-4);
        Assert.Equal(0.7782, a.Margin.DecadesToNearerEdge!.Value, 1e-4);
        Assert.Equal(BandSide.Minimum, a.Margin.NearerEdge);
    }

    [Fact]
    public void Margin_IsNegativeOutsideTheBand()
    {
        var a = Judge(TripCurve.C, 16, 40.8, Tripped(120), StartCondition.Cold);

        Assert.Equal(-Math.Log10(2), a.Margin.DecadesToNearerEdge!.Value, 1e-9);
        Assert.Equal(BandSide.Maximum, a.Margin.NearerEdge);
    }
}
