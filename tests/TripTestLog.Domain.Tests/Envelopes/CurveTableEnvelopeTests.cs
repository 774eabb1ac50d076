using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>A lab-entered curve table: log-log between rows (this tool's documented choice), nothing outside it.</summary>
public sealed class CurveTableEnvelopeTests
{
    private static CurveTablePoint Row(double m, double min, double? max) =>
        new(CurrentMultiple.Of(m), Seconds.Of(min), max is { } x ? Seconds.Of(x) : null);

    private static readonly CurveTable Table = CurveTable.Create("T", [Row(1.2, 600, null), Row(2, 15, 600), Row(3, 4, 120), Row(10, 0, 0.1)]);

    [Fact]
    public void BetweenRows_TheEdgesAreLogLogLines()
    {
        // Between (2, 15 s) and (3, 4 s): at 2.5, 15 (2.5 / 2)^(ln(4/15) / ln(3/2)) = 15 x 1.25^-3.2599 = 7.25 s by hand.
        var band = new CurveTableEnvelope(Table, Amperes.Of(32)).At(Amperes.Of(80));

        Assert.Equal(15 * Math.Pow(1.25, Math.Log(4.0 / 15) / Math.Log(1.5)), band.Minimum.Limit!.Value.Value, 9);
        Assert.Equal(7.25, band.Minimum.Limit!.Value.Value, 2);
    }

    [Fact]
    public void OutsideTheTable_ThereIsNoBand()
    {
        var envelope = new CurveTableEnvelope(Table, Amperes.Of(32));

        Assert.False(envelope.At(Amperes.Of(32)).HasRequirement);
        Assert.False(envelope.At(Amperes.Of(400)).HasRequirement);
    }

    [Fact]
    public void WhereTheMinimumReachesZero_ItFallsLinearly()
    {
        // Between (3, 4 s) and (10, 0 s): at 6.5, 4 + (0 - 4) x 3.5 / 7 = 2 s.
        Assert.Equal(2.0, new CurveTableEnvelope(Table, Amperes.Of(32)).At(Amperes.Of(208)).Minimum.Limit!.Value.Value, 9);
    }

    public static TheoryData<CurveTablePoint, CurveTablePoint, string> Broken => new()
    {
        { Row(2, 15, 600), Row(1.5, 10, 500), "multiples must rise" },
        { Row(2, 15, 600), Row(3, 20, 120), "minimum time must not rise" },
        { Row(2, 15, 600), Row(3, 4, 700), "maximum time must not rise" },
        { Row(2, 15, 600), Row(3, 4, null), "unbounded maximum" },
        { Row(2, 700, 600), Row(3, 4, 100), "minimum time is above the maximum" },
    };

    [Theory]
    [MemberData(nameof(Broken))]
    public void TablesThatBreakTheRules_AreRefused(CurveTablePoint first, CurveTablePoint second, string phrase)
    {
        var e = Assert.Throws<ArgumentException>(() => CurveTable.Create("bad", [first, second]));

        Assert.Contains(phrase, e.Message);
    }
}
