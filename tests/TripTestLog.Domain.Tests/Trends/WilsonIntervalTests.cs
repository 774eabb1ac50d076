using TripTestLog.Domain.Trends;

namespace TripTestLog.Domain.Tests.Trends;

/// <summary>The Wilson score interval (Wilson 1927) against a published worked example.</summary>
public sealed class WilsonIntervalTests
{
    // R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
    // Statistics in Medicine 17 (1998) 857-872, Table II, method 3 (Wilson score, no continuity correction), 95 %:
    // the four worked examples, printed to four decimals (quoted from memory; the values below agree with it to the
    // last printed digit). Tolerance: half a unit in the fourth decimal.
    [Theory]
    [InlineData(81, 263, 0.2553, 0.3662)]
    [InlineData(15, 148, 0.0624, 0.1605)]
    [InlineData(0, 20, 0.0000, 0.1611)]
    [InlineData(1, 29, 0.0061, 0.1718)]
    public void MatchesNewcombesWorkedExamples(int failures, int devices, double lower, double upper)
    {
        var interval = WilsonInterval.Of(failures, devices);

        Assert.InRange(interval.Lower, lower - 0.00005, lower + 0.00005);
        Assert.InRange(interval.Upper, upper - 0.00005, upper + 0.00005);
    }

    [Fact]
    public void AllOfNFailing_GivesAnUpperEndOfExactlyOne_AndALowerEndBelowIt()
    {
        var interval = WilsonInterval.Of(29, 29);

        Assert.Equal(1, interval.Upper);
        Assert.InRange(interval.Lower, 0.8829, 0.8831);
    }

    [Theory]
    [InlineData(0, 0)]
    [InlineData(-1, 10)]
    [InlineData(11, 10)]
    public void ImpossibleCounts_AreRefusedNamingTheParameter(int failures, int devices) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => WilsonInterval.Of(failures, devices));

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(0)]
    public void AQuantileThatIsNotPositiveAndFinite_IsRefused(double z) =>
        Assert.Throws<ArgumentOutOfRangeException>("z", () => WilsonInterval.Of(1, 10, z));
}
