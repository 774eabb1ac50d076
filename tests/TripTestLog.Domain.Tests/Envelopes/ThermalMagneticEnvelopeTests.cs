using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Tests.Support;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>
/// Thermal-magnetic release, In 160 A, Ir 125 A, Im 1250 A. IEC 60947-2 (8.3.3, from memory): 1.05 / 1.30 Ir
/// conventional points, 2 h conventional time above 63 A, magnetic pickup ±20 % (1000 A to 1500 A). The 50 ms
/// magnetic clearing limit is this tool's lab policy.
/// </summary>
public sealed class ThermalMagneticEnvelopeTests
{
    private static readonly ThermalMagneticEnvelope Envelope =
        new(Amperes.Of(160), new ThermalMagneticSettings(Amperes.Of(125), Amperes.Of(1250), Seconds.Of(0.05)));

    [Fact]
    public void TheConventionalPoints_HaveTheirLimits()
    {
        Assert.Equal(7200, Envelope.At(Amperes.Of(131.25)).Minimum.Limit!.Value.Value, 6);
        Assert.Equal(7200, Envelope.At(Amperes.Of(162.5)).For(Warm).Maximum.Limit!.Value.Value, 6);
    }

    [Fact]
    public void BetweenTheConventionalCurrents_OnlyTheMagneticNoOperationLimitApplies()
    {
        // 1.2 Ir: nothing requires a trip, and only the magnetic release's "no operation within 0.2 s at 0.8 Im" (IEC
        // 60947-2 8.3.3.1.2, from memory), carried to lower currents, bounds an early one.
        var band = Envelope.At(Amperes.Of(150)).For(TestConditions.Reference);

        Assert.Equal(0.2, band.Minimum.Limit!.Value.Value, 9);
        Assert.Equal("0.8Im", band.Minimum.PointLabel);
        Assert.Null(band.Maximum.Limit);
    }

    [Fact]
    public void AboveThirtyPercentOverIr_TheConventionalTripTimeCarriesUpward_ForAWarmStart()
    {
        // 3 Ir: the 1.30 Ir trip-by limit (from warm) holds at every higher current; no minimum is set here.
        var band = Envelope.At(Amperes.Of(375));

        Assert.True(band.HasRequirement);
        Assert.Equal(7200, band.For(Warm).Maximum.Limit!.Value.Value, 6);
        Assert.Null(band.For(TestConditions.Reference).Maximum.Limit);
        Assert.Equal(0.2, band.For(Warm).Minimum.Limit!.Value.Value, 9);
    }

    [Theory]
    // Magnetic 1250 A: no operation at or below 0.8 Im = 1000 A (within 0.2 s, from memory), operation from 1.2 Im =
    // 1500 A (IEC 60947-2).
    [InlineData(999, 7200.0, 0.2)]
    [InlineData(1000, 7200.0, 0.2)]
    [InlineData(1001, 7200.0, 0.0)]
    [InlineData(1499, 7200.0, 0.0)]
    [InlineData(1500, 0.05, 0.0)]
    public void TheMagneticTolerance_DecidesTheBand(double amps, double max, double min)
    {
        var band = Envelope.At(Amperes.Of(amps)).For(Warm);

        Assert.Equal(max, band.Maximum.Limit!.Value.Value, 6);
        Assert.Equal(min, band.Minimum.Limit!.Value.Value, 6);
    }

    private static readonly TestConditions Warm = new(StartCondition.Warm, PoleLoading.AllPoles);

    [Fact]
    public void ACurveTable_BandsTheGap()
    {
        var table = CurveTable.Create("TM", [
            new(CurrentMultiple.Of(2), Seconds.Of(40), Seconds.Of(400)),
            new(CurrentMultiple.Of(5), Seconds.Of(4), Seconds.Of(35)),
        ]);
        var overlay = new OverlayEnvelope(new CurveTableEnvelope(table, Amperes.Of(125)), Envelope);

        var band = overlay.At(Amperes.Of(375)).For(TestConditions.Reference);

        // At 3 Ir the table's row at 2 Ir (max 400 s) carries upward and its row at 5 Ir (min 4 s) downward.
        Assert.True(band.HasRequirement);
        Assert.Equal(EdgeSource.CurveTable, band.Maximum.Source);
        Assert.Equal(400, band.Maximum.Limit!.Value.Value, 9);
        Assert.Equal(4, band.Minimum.Limit!.Value.Value, 9);
        Assert.Equal(3.0, band.Multiple.Value, 9);
    }
}
