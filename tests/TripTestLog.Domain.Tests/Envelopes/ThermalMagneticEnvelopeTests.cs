using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

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
        Assert.Equal(7200, Envelope.At(Amperes.Of(162.5)).Maximum.Limit!.Value.Value, 6);
    }

    [Fact]
    public void BetweenTheConventionalPointsAndTheMagneticRange_ThereIsNoBand()
    {
        var band = Envelope.At(Amperes.Of(375));

        Assert.False(band.HasRequirement);
        Assert.Contains("curve table", band.NoRequirement);
    }

    [Theory]
    [InlineData(999, false, null)]
    [InlineData(1001, true, 7200.0)]
    [InlineData(1499, true, 7200.0)]
    [InlineData(1501, true, 0.05)]
    public void TheMagneticTolerance_DecidesTheBand(double amps, bool hasBand, double? max)
    {
        var band = Envelope.At(Amperes.Of(amps));

        Assert.Equal(hasBand, band.HasRequirement);
        if (hasBand)
        {
            Assert.Equal(max!.Value, band.Maximum.Limit!.Value.Value, 6);
            Assert.True(band.Minimum.IsOpen);
        }
    }

    [Fact]
    public void ACurveTable_BandsTheGap()
    {
        var table = CurveTable.Create("TM", [
            new(CurrentMultiple.Of(2), Seconds.Of(40), Seconds.Of(400)),
            new(CurrentMultiple.Of(5), Seconds.Of(4), Seconds.Of(35)),
        ]);
        var overlay = new OverlayEnvelope(new CurveTableEnvelope(table, Amperes.Of(125)), Envelope);

        var band = overlay.At(Amperes.Of(375));

        Assert.True(band.HasRequirement);
        Assert.Equal(EdgeSource.CurveTable, band.Maximum.Source);
        Assert.Equal(3.0, band.Multiple.Value, 9);
    }
}
