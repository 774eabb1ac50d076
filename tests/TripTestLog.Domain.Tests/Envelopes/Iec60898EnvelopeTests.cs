using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Tests.Support;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>
/// The envelope must reproduce IEC 60898-1 Table 7 ("Time-current operating characteristics") exactly at its points.
/// Source of every expected value in this file: IEC 60898-1:2015, Table 7, rows a to e, and the instantaneous tripping
/// ranges of Table 2 (B: 3-5 In, C: 5-10 In, D: 10-20 In).
/// </summary>
public sealed class Iec60898EnvelopeTests
{
    private const double Tolerance = 1e-9;

    private static TripBand BandAt(TripCurve curve, double rated, double multiple) =>
        new Iec60898Envelope(curve, Amperes.Of(rated)).At(Amperes.Of(rated * multiple));

    [Theory]
    // Row a: 1.13 In, from cold, no trip within 1 h for In <= 63 A, 2 h above.
    [InlineData(TripCurve.B, 6, 3600)]
    [InlineData(TripCurve.C, 63, 3600)]
    [InlineData(TripCurve.C, 80, 7200)]
    [InlineData(TripCurve.D, 125, 7200)]
    public void RowA_NoTripTimeAt113In_IsOneHourUpTo63AAndTwoHoursAbove(TripCurve curve, double rated, double expectedMin)
    {
        var band = BandAt(curve, rated, 1.13);

        Assert.Equal(expectedMin, band.Minimum.Limit!.Value.Value, Tolerance);
        Assert.Equal(EdgeSource.NormativePoint, band.Minimum.Source);
        Assert.Null(band.Maximum.Limit);
    }

    [Theory]
    // Row b: 1.45 In, straight after a, trip within 1 h for In <= 63 A, 2 h above.
    [InlineData(TripCurve.B, 10, 3600)]
    [InlineData(TripCurve.C, 63, 3600)]
    [InlineData(TripCurve.C, 80, 7200)]
    [InlineData(TripCurve.D, 100, 7200)]
    public void RowB_TripByTimeAt145In_IsOneHourUpTo63AAndTwoHoursAbove(TripCurve curve, double rated, double expectedMax)
    {
        // Row b starts warm, so it binds a warm test; a cold one trips later and is not held to it.
        var raw = new Iec60898Envelope(curve, Amperes.Of(rated)).At(Amperes.Of(rated * 1.45));
        var warm = raw.For(new TestConditions(StartCondition.Warm, PoleLoading.AllPoles));
        var cold = raw.For(TestConditions.Reference);

        Assert.Equal(expectedMax, warm.Maximum.Limit!.Value.Value, Tolerance);
        Assert.Equal(EdgeSource.NormativePoint, warm.Maximum.Source);
        Assert.True(warm.Maximum.Strict);
        Assert.Null(cold.Maximum.Limit);
    }

    [Theory]
    // Row c: 2.55 In, from cold, 1 s < t < 60 s for In <= 32 A, 1 s < t < 120 s above.
    [InlineData(TripCurve.B, 6, 60)]
    [InlineData(TripCurve.C, 32, 60)]
    [InlineData(TripCurve.C, 40, 120)]
    [InlineData(TripCurve.D, 63, 120)]
    [InlineData(TripCurve.B, 125, 120)]
    public void RowC_BandAt255In_IsOneSecondTo60sUpTo32AAnd120sAbove(TripCurve curve, double rated, double expectedMax)
    {
        var band = BandAt(curve, rated, 2.55);

        Assert.Equal(1.0, band.Minimum.Limit!.Value.Value, Tolerance);
        Assert.Equal(expectedMax, band.Maximum.Limit!.Value.Value, Tolerance);
    }

    [Theory]
    // Row d: lower limit of the instantaneous range, from cold, no trip within 0.1 s.
    [InlineData(TripCurve.B, 16, 3)]
    [InlineData(TripCurve.C, 16, 5)]
    [InlineData(TripCurve.D, 16, 10)]
    public void RowD_AtLowerInstantaneousLimit_NoTripWithinOneTenthSecond(TripCurve curve, double rated, double multiple)
    {
        var band = BandAt(curve, rated, multiple);

        Assert.Equal(0.1, band.Minimum.Limit!.Value.Value, Tolerance);
        Assert.Equal(EdgeSource.NormativePoint, band.Minimum.Source);
    }

    [Theory]
    // Row e: upper limit of the instantaneous range, from cold, trip within 0.1 s.
    [InlineData(TripCurve.B, 16, 5)]
    [InlineData(TripCurve.C, 16, 10)]
    [InlineData(TripCurve.D, 16, 20)]
    public void RowE_AtUpperInstantaneousLimit_TripWithinOneTenthSecond(TripCurve curve, double rated, double multiple)
    {
        var band = BandAt(curve, rated, multiple);

        Assert.Equal(0.1, band.Maximum.Limit!.Value.Value, Tolerance);
        Assert.True(band.Minimum.IsOpen);
    }

    [Theory]
    [InlineData(TripCurve.B, 3.01)]
    [InlineData(TripCurve.C, 5.01)]
    [InlineData(TripCurve.D, 10.01)]
    public void JustAboveTheLowerInstantaneousLimit_TheMinimumIsOpen(TripCurve curve, double multiple)
    {
        // Table 2: the instantaneous release may act anywhere above the lower limit of its range.
        Assert.True(BandAt(curve, 20, multiple).Minimum.IsOpen);
    }

    [Fact]
    public void Below113In_RowACarriesDownward()
    {
        // Row a's "no tripping within 1 h at 1.13 In" holds at every lower current; nothing requires a trip there.
        var band = BandAt(TripCurve.C, 16, 1.10);

        Assert.True(band.HasRequirement);
        Assert.Equal(3600, band.Minimum.Limit!.Value.Value, Tolerance);
        Assert.Contains("carried to lower currents", band.Minimum.Requirement);
        Assert.Null(band.Maximum.Limit);
    }

    [Fact]
    public void Between113And255In_TheLogLogLineThroughRowsAAndC_IsTypicalOnly()
    {
        // The drawn line (a documented choice, not a requirement) through (1.13, 3600 s) and (2.55, 1 s). Worked by hand:
        // n = ln(3600) / ln(2.55 / 1.13) = 10.0612; t(2) = 3600 (2 / 1.13)^-n = 11.52 s. The guaranteed minimum is row c's
        // I²t carried down: 1 s x (2.55 / 2)² = 1.6256 s.
        var expected = 3600 * Math.Pow(2.0 / 1.13, -Math.Log(3600) / Math.Log(2.55 / 1.13));

        var band = new Iec60898Envelope(TripCurve.C, Amperes.Of(16)).At(Amperes.Of(32)).For(TestConditions.Reference);

        Assert.Equal(expected, band.TypicalMinimum!.Limit!.Value.Value, 1e-6);
        Assert.Equal(11.52, band.TypicalMinimum!.Limit!.Value.Value, 0.01);
        Assert.Equal(EdgeStrength.Typical, band.TypicalMinimum!.Strength);
        Assert.Equal(1.625625, band.Minimum.Limit!.Value.Value, 1e-9);
        Assert.Equal(EdgeSource.Derived, band.Minimum.Source);
    }

    [Fact]
    public void Beyond255In_ConstantI2TIsTypical_AndRowCCarriesUpward()
    {
        // Drawn: I²t = constant from row c; by hand for C 16 A at 4 In: 60 s x (2.55 / 4)² = 24.384 s. Guaranteed: 60 s.
        var band = new Iec60898Envelope(TripCurve.C, Amperes.Of(16)).At(Amperes.Of(64)).For(TestConditions.Reference);

        Assert.Equal(24.384, band.TypicalMaximum!.Limit!.Value.Value, 0.001);
        Assert.Equal(EdgeSource.Extrapolated, band.TypicalMaximum!.Source);
        Assert.Equal(60, band.Maximum.Limit!.Value.Value, Tolerance);
        Assert.Contains("carried to higher currents", band.Maximum.Requirement);
    }

    [Fact]
    public void TheNormativePointsAreRowsAToEInRisingCurrent()
    {
        var points = new Iec60898Envelope(TripCurve.C, Amperes.Of(16)).Points;

        Assert.Equal(["a", "b", "c", "d", "e"], points.Select(p => p.Label));
        Assert.Equal([1.13, 1.45, 2.55, 5.0, 10.0], points.Select(p => p.Multiple.Value));
    }

    [Theory]
    // IEC 60898-1 9.10.3 (from memory): 1.1 x 1.45 In for two poles, 1.2 x 1.45 In for three and four.
    [InlineData(2, 1.595)]
    [InlineData(3, 1.74)]
    [InlineData(4, 1.74)]
    public void AMultipoleBreaker_HasTheSinglePolePoint(int poles, double multiple)
    {
        var point = new Iec60898Envelope(TripCurve.C, Amperes.Of(16), poles: poles).Points.Single(p => p.Label == "1-pole");

        Assert.Equal(multiple, point.Multiple.Value, 1e-9);
        Assert.Equal(PoleLoading.OnePole, point.Loading);
        Assert.Equal(3600, point.MustTripWithin!.Value.Value);
    }
}
