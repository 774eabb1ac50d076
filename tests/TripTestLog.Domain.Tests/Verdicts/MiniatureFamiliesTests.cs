using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// RCBOs (IEC 61009-1: the overcurrent rows of IEC 60898-1 Table 7) and d.c. miniature breakers (IEC 60898-2: curves B
/// and C only, which its marking clause states; instantaneous ranges B 4-7 In and C 7-15 In, from memory).
/// </summary>
public sealed class MiniatureFamiliesTests
{
    private static Device Breaker(DeviceFamily family, TripCurve curve, int poles, Supply supply = Supply.Ac) =>
        new(AssetTag.Of("F-1"), "S", "L", family, Amperes.Of(16), poles, Volts.Of(230), null, null, "", "", "",
            new Iec60898Settings(curve) { Supply = supply });

    private static TripAssessment Judge(Device device, double amps, double tripSeconds, string pole) =>
        new TripAssessor(new Dictionary<string, CurveTable>(), new Dictionary<string, AmbientTable>()).Assess(new DeviceHistory([device]),
            new TripMeasurement(device.Tag, TestedAt.OnDate(new DateOnly(2025, 6, 1)), TestStage.AsFound, Pole.Parse(pole), Amperes.Of(amps),
                TripOutcome.TrippedAfter(Seconds.Of(tripSeconds)), StartCondition.Cold, null, "", "", "")).Assessment;

    [Fact]
    public void AnRcboLoadedOnOnePole_IsNotCalledTooEarly()
    {
        // One pole alone carries a residual current; the residual-current release acts in tens of ms.
        var rcbo = Breaker(DeviceFamily.Iec61009, TripCurve.C, 2);

        var onePole = Judge(rcbo, 23.2, 0.03, "1");
        var allPoles = Judge(rcbo, 23.2, 0.03, "all");

        Assert.Equal(Verdict.NotAssessable, onePole.Verdict);
        Assert.Contains("residual current", onePole.Reason);
        Assert.Equal(Verdict.TooEarly, allPoles.Verdict);
        Assert.Equal("IEC 61009-1", new Iec60898Envelope(TripCurve.C, Amperes.Of(16), rcbo: true).Standard);
    }

    [Theory]
    // d.c. curve C: no trip within 0.1 s up to 7 In, trip within 0.1 s from 15 In. On a.c. 7 In is above row d (5 In).
    [InlineData(6.9, 0.05, Verdict.TooEarly)]
    [InlineData(7.1, 0.05, Verdict.NotAssessable)]   // just above d: the threshold may sit there; d not proved
    [InlineData(7.1, 0.15, Verdict.Pass)]            // after 0.1 s within d's window: proves it
    [InlineData(14.9, 0.5, Verdict.NotAssessable)]   // just below e: no trip required yet, e not proved
    [InlineData(15.2, 0.05, Verdict.Pass)]
    [InlineData(15.0, 0.5, Verdict.TooLate)]
    public void ADcBreaker_HasItsOwnInstantaneousRange(double multiple, double tripSeconds, Verdict expected)
    {
        Assert.Equal(expected, Judge(Breaker(DeviceFamily.Iec60898, TripCurve.C, 1, Supply.Dc), 16 * multiple, tripSeconds, "all").Verdict);
    }

    [Fact]
    public void CurveDOnDirectCurrent_IsRefused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Iec60898Envelope(TripCurve.D, Amperes.Of(16), supply: Supply.Dc));
    }
}
