using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Tests.Support;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>
/// A hand-checked electronic trip unit: In 630 A, Ir 400 A, tr 10 s at 6 Ir (inverse I²t), Isd 2400 A with tsd 0.2 s,
/// Ii 4800 A; time tolerance ±20 % (this tool's lab policy). Pickup tolerance ±20 % and the 1.05 / 1.30 Ir conventional
/// points are IEC 60947-2 (8.3.3, quoted from memory). Expected bands worked by hand:
/// long time t = 10 (6 / M)²; short time may act from 1920 A, must from 2880 A; instantaneous may act from 3840 A,
/// must from 5760 A.
/// </summary>
public sealed class ElectronicTripEnvelopeTests
{
    private static readonly ElectronicTripSettings Unit = new(
        Amperes.Of(400), Seconds.Of(10), 6, Amperes.Of(2400), Seconds.Of(0.2), false, Amperes.Of(4800),
        TimeTolerance.Of(0.20, Seconds.Of(0.02)), Seconds.Of(0.05));

    private static TripBand At(double multipleOfIr) => new ElectronicTripEnvelope(Amperes.Of(630), Unit).At(Amperes.Of(400 * multipleOfIr));

    [Theory]
    // 2 Ir: long time only, 90 s ±20 %.
    [InlineData(2, 72, 108)]
    // 5 Ir = 2000 A: short time may act (>= 1920 A): 0.16 s; long time 14.4 s ±20 % is still the latest.
    [InlineData(5, 0.16, 17.28)]
    // 7 Ir = 2800 A: short time may but need not act (< 2880 A); long time 7.347 s +20 %.
    [InlineData(7, 0.16, 8.8163)]
    // 11 Ir = 4400 A: short time must act (0.24 s); instantaneous may act (>= 3840 A), so the minimum is 0.
    [InlineData(11, 0, 0.24)]
    // 13 Ir = 5200 A: instantaneous still need not act (< 5760 A).
    [InlineData(13, 0, 0.24)]
    public void TheBandAtEachMultiple_IsTheHandWorkedOne(double multiple, double min, double max)
    {
        var band = At(multiple);

        Assert.Equal(min, band.Minimum.Limit!.Value.Value, 4);
        Assert.Equal(max, band.Maximum.Limit!.Value.Value, 4);
    }

    [Theory]
    // Short-time pickup ±20 % of 2400 A: 1920 A and 2880 A.
    [InlineData(1919, 1921, true)]
    [InlineData(2879, 2881, false)]
    // Instantaneous ±20 % of 4800 A: 3840 A and 5760 A.
    [InlineData(3839, 3841, true)]
    [InlineData(5759, 5761, false)]
    public void JustInsideAndOutsideEachPickupEdge_TheBandChanges(double below, double above, bool minimumEdge)
    {
        var envelope = new ElectronicTripEnvelope(Amperes.Of(630), Unit);
        var (lo, hi) = (envelope.At(Amperes.Of(below)), envelope.At(Amperes.Of(above)));

        var (a, b) = minimumEdge ? (lo.Minimum, hi.Minimum) : (lo.Maximum, hi.Maximum);
        Assert.True(b.Limit!.Value < a.Limit!.Value, $"the edge should drop between {below} A and {above} A");
    }

    [Theory]
    // IEC 60947-2: conventional time 1 h for In <= 63 A, 2 h above.
    [InlineData(63, 3600)]
    [InlineData(630, 7200)]
    public void At105Ir_TheMinimumIsTheConventionalTime(double rated, double expected)
    {
        var s = Unit with { Ir = Amperes.Of(40), Isd = null, Tsd = null, Ii = null };
        var band = new ElectronicTripEnvelope(Amperes.Of(rated), s).At(Amperes.Of(42));

        Assert.Equal(expected, band.Minimum.Limit!.Value.Value, 6);
        Assert.Equal(EdgeSource.NormativePoint, band.Minimum.Source);
    }

    [Fact]
    public void Below105Ir_TheConventionalNoTripTimeCarriesDownward()
    {
        var band = At(1.0);

        Assert.True(band.HasRequirement);
        Assert.Equal(7200, band.Minimum.Limit!.Value.Value, 6);
        Assert.Null(band.Maximum.Limit);
    }

    [Fact]
    public void WithI2tOn_TheShortTimeDelayIsInverseBelowTenIr()
    {
        // tsd 0.2 s I²t: at 8 Ir (3200 A), 0.2 (10 / 8)² = 0.3125 s, +20 % = 0.375 s; long time there is 5.625 s +20 %.
        var band = new ElectronicTripEnvelope(Amperes.Of(630), Unit with { TsdI2t = true, Ii = null }).At(Amperes.Of(3200));

        Assert.Equal(0.375, band.Maximum.Limit!.Value.Value, 4);
    }
}
