using CsCheck;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Tests.Support;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>Properties every envelope must have, over many random devices and currents.</summary>
public sealed class EnvelopePropertyTests
{
    private static readonly Gen<(TripCurve Curve, double Rated, double M1, double M2)> Cases =
        Gen.Select(Gen.Int[0, 2].Select(i => (TripCurve)i), Gen.Double[0.5, 125], Gen.Double[1.13, 60], Gen.Double[1.13, 60]);

    [Fact]
    public void EdgesNeverRiseAsTheCurrentRises()
    {
        Cases.Sample(c =>
        {
            var envelope = new Iec60898Envelope(c.Curve, Amperes.Of(c.Rated));
            var (lo, hi) = c.M1 <= c.M2 ? (c.M1, c.M2) : (c.M2, c.M1);
            var low = envelope.At(Amperes.Of(c.Rated * lo));
            var high = envelope.At(Amperes.Of(c.Rated * hi));

            Assert.True(high.Minimum.Limit!.Value <= low.Minimum.Limit!.Value, $"minimum rose from {lo} to {hi} In");
            Assert.True(Upper(high) <= Upper(low), $"maximum rose from {lo} to {hi} In");
        }, iter: 20_000);
    }

    [Fact]
    public void MinimumNeverExceedsMaximum()
    {
        Cases.Sample(c =>
        {
            var band = new Iec60898Envelope(c.Curve, Amperes.Of(c.Rated)).At(Amperes.Of(c.Rated * c.M1));

            Assert.True(band.Minimum.Limit!.Value.Value <= Upper(band), $"min above max at {c.M1} In");
        }, iter: 20_000);
    }

    private static double Upper(TripBand band) => band.Maximum.Limit?.Value ?? double.PositiveInfinity;
}
