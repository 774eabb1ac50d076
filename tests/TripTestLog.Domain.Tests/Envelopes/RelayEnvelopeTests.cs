using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Domain.Tests.Support;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>
/// The relay envelope: the IEC 60255-151 characteristic with this tool's default tolerances (lab policy: time ±5 %, at
/// least ±40 ms; pickup ±5 %). Expected values are hand arithmetic from IEC 60255-151 Table 1.
/// </summary>
public sealed class RelayEnvelopeTests
{
    private static RelaySettings StandardInverse(double tms = 0.1, Seconds? opening = null) => new(
        IdmtCurve.StandardInverse, Amperes.Of(200), tms, null, null, LabPolicy.RelayTimeTolerance, LabPolicy.RelayPickupTolerance,
        opening ?? Seconds.Zero);

    private static TripBand At(RelaySettings s, double amps) => new RelayEnvelope(s).At(Amperes.Of(amps));

    [Fact]
    public void At10TimesPickup_TheBandIsTheCharacteristicWithinItsTolerance()
    {
        // 0.2971 s nominal; 5 % is 15 ms, below the 40 ms floor, so the band is 0.2571 s to 0.3371 s.
        var band = At(StandardInverse(), 2000);

        Assert.Equal(0.2571, band.Minimum.Limit!.Value.Value, 4);
        Assert.Equal(0.3371, band.Maximum.Limit!.Value.Value, 4);
        Assert.Equal(EdgeSource.Characteristic, band.Maximum.Source);
    }

    [Fact]
    public void TheOpeningTime_IsAddedToTheLatestTimeOnly()
    {
        var band = At(StandardInverse(opening: Seconds.Of(0.05)), 2000);

        Assert.Equal(0.2571, band.Minimum.Limit!.Value.Value, 4);
        Assert.Equal(0.3871, band.Maximum.Limit!.Value.Value, 4);
    }

    [Theory]
    // Pickup 200 A ±5 %: must not operate below 190 A, may from 190 A; must from 1.1 x 1.05 x 200 = 231 A (the operate
    // threshold of 1.1 x setting, IEC 60255-151 from memory, with the start accuracy; lab policy).
    [InlineData(189.9, false, false)]
    [InlineData(190.1, true, false)]
    [InlineData(230.9, true, false)]
    [InlineData(231.1, true, true)]
    public void ThePickupTolerance_DecidesWhetherItMayOrMustOperate(double amps, bool may, bool must)
    {
        var band = At(StandardInverse(), amps);

        Assert.Equal(may, band.Minimum.Limit is not null);
        Assert.Equal(must, new RelayEnvelope(StandardInverse()).At(Amperes.Of(amps)).Maximums.Count > 0);
    }

    [Theory]
    [InlineData(2000, 0.30, Verdict.Pass)]
    [InlineData(2000, 0.40, Verdict.TooLate)]
    [InlineData(2000, 0.20, Verdict.TooEarly)]
    [InlineData(180, 5.0, Verdict.TooEarly)]
    public void TripsAreJudgedByTheCharacteristic(double amps, double tripSeconds, Verdict expected)
    {
        var m = new TripMeasurement(AssetTag.Of("R-1"), TestedAt.OnDate(new DateOnly(2025, 1, 1)), TestStage.AsFound, Pole.All,
            Amperes.Of(amps), TripOutcome.TrippedAfter(Seconds.Of(tripSeconds)), StartCondition.Cold, null, "", "", "");

        var a = TripJudge.Assess(new RelayEnvelope(StandardInverse()), m);

        Assert.Equal(expected, a.Verdict);
    }

    [Fact]
    public void OutsideTwoToTwentyTimesPickup_TheFormulaOnlyAdvises()
    {
        TripAssessment Judge(double amps, double s) => TripJudge.Assess(new RelayEnvelope(StandardInverse()),
            new TripMeasurement(AssetTag.Of("R-1"), TestedAt.OnDate(new DateOnly(2025, 1, 1)), TestStage.AsFound, Pole.All,
                Amperes.Of(amps), TripOutcome.TrippedAfter(Seconds.Of(s)), StartCondition.Cold, null, "", "", ""));

        // At 1.5 x Is the formula gives 0.14 x 0.1 / (1.5^0.02 - 1) = 1.7194 s; no accuracy is declared there, so a 2.5 s
        // trip is an advisory on the drawn formula; the relay must operate, and the lab's bound (2 x the curve time at
        // 1.5 / 1.05 = 1.4286 x Is, 1.9556 s + 5 % = 2.0534 s, so 4.107 s) makes 10 s too late. The minimum at 2 x Is
        // (1.0029 s less 5 %) carried downward still binds.
        var inRange = Judge(1000, 0.43);
        var slowish = Judge(300, 2.5);
        var slow = Judge(300, 10);
        var early = Judge(300, 0.9);

        Assert.Equal(VerdictBasis.Normative, inRange.Basis);
        Assert.Equal(Verdict.Pass, slowish.Verdict);
        Assert.Contains("must operate from", slowish.Proved);
        Assert.Contains(slowish.Advisories, a => a.Side == BandSide.Maximum);
        Assert.Equal(Verdict.TooLate, slow.Verdict);
        Assert.Equal(Verdict.TooEarly, early.Verdict);
    }

    [Fact]
    public void AHoldBelowPickup_Passes()
    {
        var m = new TripMeasurement(AssetTag.Of("R-1"), TestedAt.OnDate(new DateOnly(2025, 1, 1)), TestStage.AsFound, Pole.All,
            Amperes.Of(150), TripOutcome.HeldFor(Seconds.Of(30)), StartCondition.Cold, null, "", "", "");

        Assert.Equal(Verdict.Pass, TripJudge.Assess(new RelayEnvelope(StandardInverse()), m).Verdict);
    }

    [Fact]
    public void AHighSetStage_TakesOverAboveItsPickup()
    {
        // High-set 2000 A ±5 % after 50 ms: from 2100 A the latest time is 50 ms + 40 ms floor = 90 ms.
        var s = StandardInverse() with { HighSet = Amperes.Of(2000), HighSetDelay = Seconds.Of(0.05) };

        Assert.Equal(0.3371, At(s, 2000).Maximum.Limit!.Value.Value, 4);
        Assert.Equal(0.09, At(s, 2200).Maximum.Limit!.Value.Value, 4);
        Assert.Equal(0.01, At(s, 2200).Minimum.Limit!.Value.Value, 4);
    }
}
