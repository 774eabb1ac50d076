using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// Verdicts against IEC 60898-1:2015 Table 7 (rows a-e) and Table 2 (instantaneous ranges), worked by hand from the
/// table. Each row is a requirement on one side only, carried in the direction physics gives it: a no-trip limit holds
/// at every lower current, a trip-by limit at every higher one. The table writes its limits strictly or inclusively
/// (a "t ≤ 1 h no tripping", b "t &lt; 1 h", c "1 s &lt; t &lt; 60 s", d "t ≤ 0.1 s no tripping", e "t &lt; 0.1 s").
/// </summary>
public sealed class TripJudgeTests
{
    internal static TripAssessment Judge(TripCurve curve, double rated, double currentA, TripOutcome outcome, StartCondition start, int poles = 1, string pole = "all")
    {
        var envelope = new Iec60898Envelope(curve, Amperes.Of(rated), poles: poles);
        var measurement = new TripMeasurement(
            AssetTag.Of("T-1"), TestedAt.OnDate(new DateOnly(2024, 3, 18)), TestStage.AsFound, Pole.Parse(pole),
            Amperes.Of(currentA), outcome, start, null, "", "", "");
        return TripJudge.Assess(envelope, measurement, TestConditions.Of(measurement, poles));
    }

    internal static TripOutcome Tripped(double s) => TripOutcome.TrippedAfter(Seconds.Of(s));

    internal static TripOutcome Held(double s) => TripOutcome.HeldFor(Seconds.Of(s));

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
    // Table 7 as written: row c "1 s < t < 60 s", row d "t ≤ 0.1 s, no tripping", row e "t < 0.1 s, tripping",
    // row b "t < 1 h", row a "t ≤ 1 h, no tripping". Test sets export milliseconds, so each edge is a real reading.
    [InlineData(2.55, 1.000, StartCondition.Cold, Verdict.TooEarly)]
    [InlineData(2.55, 1.001, StartCondition.Cold, Verdict.Pass)]
    [InlineData(2.55, 60.000, StartCondition.Cold, Verdict.TooLate)]
    [InlineData(2.55, 59.999, StartCondition.Cold, Verdict.Pass)]
    [InlineData(5.0, 0.100, StartCondition.Cold, Verdict.TooEarly)]
    [InlineData(5.0, 0.101, StartCondition.Cold, Verdict.Pass)]
    [InlineData(10.0, 0.100, StartCondition.Cold, Verdict.TooLate)]
    [InlineData(10.0, 0.099, StartCondition.Cold, Verdict.Pass)]
    [InlineData(1.45, 3600.0, StartCondition.Warm, Verdict.TooLate)]
    [InlineData(1.45, 3599.9, StartCondition.Warm, Verdict.Pass)]
    [InlineData(1.13, 3600.0, StartCondition.Cold, Verdict.TooEarly)]
    [InlineData(1.13, 3600.1, StartCondition.Cold, Verdict.Pass)]
    public void ATripExactlyOnALimit_IsJudgedAsTheTableWritesIt(double multiple, double tripSeconds, StartCondition start, Verdict expected)
    {
        Assert.Equal(expected, Judge(TripCurve.C, 16, 16 * multiple, Tripped(tripSeconds), start).Verdict);
    }

    [Fact]
    public void AHoldOfExactlyOneHourAtRowA_ProvesIt()
    {
        // "t ≤ 1 h, no tripping": carrying 1.13 In for the full hour is the requirement itself.
        var a = Judge(TripCurve.C, 16, 18.08, Held(3600), StartCondition.Cold);

        Assert.Equal(Verdict.Pass, a.Verdict);
        Assert.Equal("a", a.Point!.Label);
    }

    [Theory]
    // The instantaneous release may act anywhere above row d's current, and a 0.1 s trip is required only from row e's;
    // a test 2 % off either row, on the side where the threshold may sit, neither breaks nor proves the row.
    [InlineData(5.10, 0.020, Verdict.NotAssessable)]  // C16 2 % above 5 In: no minimum is left, row d not proved
    [InlineData(9.75, 0.5, Verdict.NotAssessable)]    // C16 2.5 % below 10 In: no 0.1 s trip is required yet
    [InlineData(7.00, 0.020, Verdict.Pass)]           // a trip within 0.1 s below row e proves e a fortiori
    [InlineData(10.2, 0.020, Verdict.Pass)]           // 2 % above row e, within its window: proves it
    [InlineData(4.90, 0.020, Verdict.TooEarly)] // below 5 In row d's "no trip within 0.1 s" still holds
    [InlineData(10.2, 0.5, Verdict.TooLate)]   // above 10 In row e's "trip in less than 0.1 s" holds
    public void AroundTheInstantaneousRange_EachRowHoldsOnItsOwnSide(double multiple, double tripSeconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(TripCurve.C, 16, 16 * multiple, Tripped(tripSeconds), StartCondition.Cold).Verdict);
    }

    [Theory]
    // Rows a and b carried in their own direction only.
    [InlineData(1.12, 1800, false, StartCondition.Cold, Verdict.TooEarly)]   // below 1.13 In: no trip within 1 h
    [InlineData(1.15, 1800, false, StartCondition.Cold, Verdict.NotAssessable)] // 1.8 % above row a: its limit may fall away
    [InlineData(1.25, 1800, false, StartCondition.Cold, Verdict.Pass)]       // cold trip within 1 h below 1.45 In proves row b
    [InlineData(1.15, 3600, true, StartCondition.Cold, Verdict.Pass)]        // a hold at or above 1.13 In proves row a
    [InlineData(1.44, 3600, true, StartCondition.Warm, Verdict.NotAssessable)] // just below 1.45 In a release may never trip
    [InlineData(1.46, 3600, true, StartCondition.Warm, Verdict.TooLate)]     // at or above 1.45 In row b requires a trip
    [InlineData(1.44, 1200, false, StartCondition.Warm, Verdict.Pass)]
    public void TheConventionalRows_HoldOnTheirOwnSideOnly(double multiple, double seconds, bool held, StartCondition start, Verdict expected)
    {
        var outcome = held ? Held(seconds) : Tripped(seconds);

        Assert.Equal(expected, Judge(TripCurve.C, 16, 16 * multiple, outcome, start).Verdict);
    }

    [Theory]
    // Row c on both sides of 2.55 In (C16, from cold): its "1 s < t" carries down (as I²t: at 2.50 In, 1 s x
    // (2.55 / 2.5)² = 1.0404 s), its "t < 60 s" up. Within the ±3 % window the row's own limits hold too, moved by the
    // first-order thermal bound with Mc = 1.45 In (worked by hand: at 2.50 In, -ln(1 - (1.45/2.5)²) / -ln(1 - (1.45/2.55)²)
    // = 0.4101 / 0.3906 = 1.050, so 63.0 s; at 2.60 In the 1 s minimum x 0.3725/0.3906 = 0.954 s). Outside the window
    // (2.70 In) only the carried limits and row d's 0.1 s remain, and a trip there proves nothing.
    [InlineData(2.50, 1.03, Verdict.TooEarly)]
    [InlineData(2.50, 70, Verdict.TooLate)]
    [InlineData(2.50, 62, Verdict.NotAssessable)]
    [InlineData(2.50, 30, Verdict.Pass)]
    [InlineData(2.60, 0.5, Verdict.TooEarly)]
    [InlineData(2.60, 0.97, Verdict.NotAssessable)]
    [InlineData(2.60, 1.2, Verdict.Pass)]
    [InlineData(2.60, 61, Verdict.TooLate)]
    [InlineData(2.70, 0.5, Verdict.NotAssessable)]
    public void RowC_HoldsEachLimitOnItsOwnSide(double multiple, double tripSeconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(TripCurve.C, 16, 16 * multiple, Tripped(tripSeconds), StartCondition.Cold).Verdict);
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

    [Theory]
    // Row b: 1.45 In straight after a (warm), trip within 1 h up to 63 A, 2 h above.
    [InlineData(63, 3600, Verdict.TooLate)]
    [InlineData(80, 3600, Verdict.NotAssessable)]
    [InlineData(80, 7200, Verdict.TooLate)]
    public void WarmHoldAt145In_IsTooLateOnlyOnceTheConventionalTimeHasRun(double rated, double heldSeconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(TripCurve.C, rated, rated * 1.45, Held(heldSeconds), StartCondition.Warm).Verdict);
    }

    [Fact]
    public void ColdHoldAt145In_IsNotAssessable_BecauseRowBStartsWarm()
    {
        var a = Judge(TripCurve.C, 16, 23.2, Held(3600), StartCondition.Cold);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("from warm", a.Reason);
    }

    [Fact]
    public void WarmTripBeforeAColdMinimum_IsNotAssessable()
    {
        // Row c's 1 s minimum is from cold; a warm release trips sooner, so 0.5 s proves nothing.
        var a = Judge(TripCurve.C, 16, 40.8, Tripped(0.5), StartCondition.Warm);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("from cold", a.Reason);
    }

    [Fact]
    public void HoldStoppedBeforeTheTripByLimitOfRowC_IsNotAssessable()
    {
        Assert.Equal(Verdict.NotAssessable, Judge(TripCurve.C, 16, 40.8, Held(30), StartCondition.Cold).Verdict);
    }

    [Fact]
    public void HoldOfOneTenthSecondAtRowD_Passes()
    {
        var a = Judge(TripCurve.C, 16, 80, Held(0.2), StartCondition.Cold);

        Assert.Equal(Verdict.Pass, a.Verdict);
        Assert.Equal("d", a.Point!.Label);
    }

    [Fact]
    public void HoldAtTheUpperInstantaneousLimit_IsTooLate()
    {
        Assert.Equal(Verdict.TooLate, Judge(TripCurve.C, 16, 160, Held(0.2), StartCondition.Cold).Verdict);
    }

    [Fact]
    public void BelowTheTable_RowAStillForbidsATripWithinTheHour()
    {
        // 1.05 In: row a ("no tripping within 1 h at 1.13 In") holds at every lower current, but a hold there, 7 % below
        // the point and outside its window, does not prove it: a lower current trips later.
        var held = Judge(TripCurve.C, 16, 16.8, Held(3600), StartCondition.Cold);
        var tripped = Judge(TripCurve.C, 16, 16.8, Tripped(600), StartCondition.Cold);

        Assert.Equal(Verdict.NotAssessable, held.Verdict);
        Assert.Contains("nearest point is a (1.13 In from cold)", held.Reason);
        Assert.Equal(Verdict.TooEarly, tripped.Verdict);
        Assert.Contains("carried to lower currents", tripped.Reason);
    }
}
