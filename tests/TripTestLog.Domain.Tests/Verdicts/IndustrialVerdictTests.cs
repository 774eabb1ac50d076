using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// IEC 60947-2 breakers (8.3.3, quoted from memory): 1.05 Ir no trip and 1.30 Ir trip within the conventional time
/// (2 h above 63 A), each carried in its own direction; short-time and instantaneous releases do not operate at 80 % of
/// their setting and operate at 120 %. Electronic unit as in <c>ElectronicTripEnvelopeTests</c>: Ir 400 A, tr 10 s at
/// 6 Ir, Isd 2400 A tsd 0.2 s, Ii 4800 A, ±20 % time tolerance (lab policy).
/// </summary>
public sealed class IndustrialVerdictTests
{
    private static readonly ElectronicTripSettings Unit = new(
        Amperes.Of(400), Seconds.Of(10), 6, Amperes.Of(2400), Seconds.Of(0.2), false, Amperes.Of(4800),
        TimeTolerance.Of(0.20, Seconds.Of(0.02)), Seconds.Of(0.05));

    private static readonly ThermalMagneticSettings Tm = new(Amperes.Of(125), Amperes.Of(1250), Seconds.Of(0.05));

    private static TripAssessment Judge(ITripEnvelope envelope, double amps, TripOutcome outcome, StartCondition start) =>
        TripJudge.Assess(envelope, new TripMeasurement(AssetTag.Of("I-1"), TestedAt.OnDate(new DateOnly(2025, 5, 1)), TestStage.AsFound,
            Pole.All, Amperes.Of(amps), outcome, start, null, "", "", ""));

    private static TripOutcome Tripped(double s) => TripOutcome.TrippedAfter(Seconds.Of(s));

    private static TripOutcome Held(double s) => TripOutcome.HeldFor(Seconds.Of(s));

    [Fact]
    public void AnElectronicUnitTrippingOnItsOwnCurveAt12Ir_Passes()
    {
        // 1.2 Ir = 480 A: t = 10 (6 / 1.2)² = 250 s nominal, 200 s to 300 s with ±20 %. The old drawn minimum was 693 s.
        var a = Judge(new ElectronicTripEnvelope(Amperes.Of(630), Unit), 480, Tripped(250), StartCondition.Cold);

        Assert.Equal(Verdict.Pass, a.Verdict);
        Assert.Equal(200, a.Band.Minimum.Limit!.Value.Value, 6);
    }

    [Theory]
    // 1.30 Ir = 520 A: t = 10 (6 / 1.3)² = 213.0 s, band 170.4 s to 255.6 s, at either start without thermal memory.
    [InlineData(StartCondition.Warm, 1000, Verdict.TooLate)]
    [InlineData(StartCondition.Cold, 1000, Verdict.TooLate)]
    [InlineData(StartCondition.Warm, 213, Verdict.Pass)]
    [InlineData(StartCondition.Warm, 150, Verdict.TooEarly)]
    public void WithoutThermalMemory_TheSetCurveBindsEitherStart(StartCondition start, double seconds, Verdict expected)
    {
        var envelope = new ElectronicTripEnvelope(Amperes.Of(630), Unit);

        var a = Judge(envelope, 520, Tripped(seconds), start);

        Assert.Equal(expected, a.Verdict);
        Assert.Equal(255.6213, a.Band.Maximum.Limit!.Value.Value, 3);
    }

    [Fact]
    public void WithThermalMemory_AWarmTripBeforeTheCurve_IsNotAssessable()
    {
        var envelope = new ElectronicTripEnvelope(Amperes.Of(630), Unit with { ThermalMemory = true });

        Assert.Equal(Verdict.NotAssessable, Judge(envelope, 520, Tripped(150), StartCondition.Warm).Verdict);
        Assert.Equal(Verdict.TooEarly, Judge(envelope, 520, Tripped(150), StartCondition.Cold).Verdict);
    }

    [Theory]
    // Ii 4800 A: no operation at 0.8 Ii = 3840 A, where the short-time delay (0.2 s -20 % = 0.16 s) is the earliest.
    [InlineData(3840, 0.02, Verdict.TooEarly)]
    [InlineData(3841, 0.02, Verdict.Pass)]
    // Isd 2400 A: no operation at 0.8 Isd = 1920 A, where the long time (10 (6 / 4.8)² = 15.6 s -20 %) is the earliest.
    [InlineData(1920, 0.2, Verdict.TooEarly)]
    [InlineData(1921, 0.2, Verdict.Pass)]
    // Operation at 1.2 Ii = 5760 A within the 50 ms lab limit.
    [InlineData(5760, 0.06, Verdict.TooLate)]
    public void EightyAndOneHundredTwentyPerCent_OfEachSetting(double amps, double seconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(new ElectronicTripEnvelope(Amperes.Of(630), Unit), amps, Tripped(seconds), StartCondition.Cold).Verdict);
    }

    [Theory]
    // Thermal-magnetic, In 160 A, Ir 125 A: the 1.30 Ir trip-by limit of 2 h carries upward for a warm start.
    [InlineData(375, true, 9000, StartCondition.Warm, Verdict.TooLate)]        // held 2.5 h at 3 Ir after the 1.05 Ir test
    [InlineData(375, true, 9000, StartCondition.Cold, Verdict.NotAssessable)]  // a cold release may take longer
    [InlineData(375, false, 40, StartCondition.Cold, Verdict.NotAssessable)]   // meets the carried limit, proves no point
    [InlineData(160, false, 40, StartCondition.Cold, Verdict.Pass)]            // 1.28 Ir, in 1.30 Ir's window: a cold trip within 2 h proves it
    [InlineData(150, false, 40, StartCondition.Cold, Verdict.Pass)]            // 1.2 Ir: a cold trip within 2 h proves 1.30 Ir a fortiori
    [InlineData(130, false, 3600, StartCondition.Cold, Verdict.TooEarly)]      // at and below 1.05 Ir: no trip within 2 h
    public void AThermalMagneticRelease_IsJudgedByItsConventionalPoints(double amps, bool held, double seconds, StartCondition start, Verdict expected)
    {
        var envelope = new ThermalMagneticEnvelope(Amperes.Of(160), Tm);

        Assert.Equal(expected, Judge(envelope, amps, held ? Held(seconds) : Tripped(seconds), start).Verdict);
    }

    [Theory]
    // Both sides of the conventional points (Ir 125 A: 1.05 Ir = 131.25 A, 1.30 Ir = 162.5 A; 2 h above 63 A).
    [InlineData(130.0, false, 7000, StartCondition.Cold, Verdict.TooEarly)]       // just below 1.05 Ir: no trip within 2 h
    [InlineData(132.5, false, 7000, StartCondition.Cold, Verdict.NotAssessable)]  // just above: 1.05 Ir says nothing of a trip
    [InlineData(131.25, false, 7200, StartCondition.Cold, Verdict.TooEarly)]      // exactly the conventional time: within it
    [InlineData(131.25, true, 7200, StartCondition.Cold, Verdict.Pass)]           // a full hold proves the point
    [InlineData(161.0, true, 7300, StartCondition.Warm, Verdict.NotAssessable)]   // just below 1.30 Ir: no trip is required
    [InlineData(164.0, true, 7300, StartCondition.Warm, Verdict.TooLate)]         // just above: the trip-by limit holds
    [InlineData(162.5, false, 7200, StartCondition.Warm, Verdict.Pass)]           // "within the conventional time" includes it
    public void TheConventionalPoints_HoldOnTheirOwnSide(double amps, bool held, double seconds, StartCondition start, Verdict expected)
    {
        var envelope = new ThermalMagneticEnvelope(Amperes.Of(160), Tm);

        Assert.Equal(expected, Judge(envelope, amps, held ? Held(seconds) : Tripped(seconds), start).Verdict);
    }

    [Fact]
    public void AColdTripInTheThermalMagneticGap_SaysWhatWasNotChecked()
    {
        var a = Judge(new ThermalMagneticEnvelope(Amperes.Of(160), Tm), 375, Tripped(40), StartCondition.Cold);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("nearest point is 1.30Ir", a.Reason);
    }

    [Fact]
    public void ACurveTableThatContradictsTheSettings_JudgesNothing()
    {
        // The lab's table says no trip before 2 s up to 4 Ir; the register's Im 250 A (2 Ir) must clear by 50 ms from 300 A.
        var table = CurveTable.Create("BAD", [
            new(CurrentMultiple.Of(1.5), Seconds.Of(20), Seconds.Of(900)),
            new(CurrentMultiple.Of(4), Seconds.Of(2), Seconds.Of(60))]);
        var tm = new ThermalMagneticEnvelope(Amperes.Of(160), new ThermalMagneticSettings(Amperes.Of(125), Amperes.Of(250), Seconds.Of(0.05)));
        var envelope = new OverlayEnvelope(new CurveTableEnvelope(table, Amperes.Of(125)), tm);

        var a = Judge(envelope, 375, Tripped(0.03), StartCondition.Cold);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("contradict", a.Reason);
    }
}
