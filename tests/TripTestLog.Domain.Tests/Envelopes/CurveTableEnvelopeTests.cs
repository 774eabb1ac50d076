using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Tests.Support;

namespace TripTestLog.Domain.Tests.Envelopes;

/// <summary>A lab-entered curve table: log-log between rows (this tool's documented choice), nothing outside it.</summary>
public sealed class CurveTableEnvelopeTests
{
    private static CurveTablePoint Row(double m, double min, double? max) =>
        new(CurrentMultiple.Of(m), Seconds.Of(min), max is { } x ? Seconds.Of(x) : null);

    private static readonly CurveTable Table = CurveTable.Create("T", [Row(1.2, 600, null), Row(2, 15, 600), Row(3, 4, 120), Row(10, 0, 0.1)]);

    [Fact]
    public void BetweenRows_TheRowsAreGuaranteed_AndTheLogLogLinesTypical()
    {
        // Between (2, 15 s, 600 s) and (3, 4 s, 120 s) at 2.5: the upper row's minimum (4 s) holds at lower currents and the
        // lower row's maximum (600 s) at higher ones. The drawn minimum is 15 (2.5 / 2)^(ln(4/15) / ln(3/2)) = 7.25 s by hand.
        var band = new CurveTableEnvelope(Table, Amperes.Of(32)).At(Amperes.Of(80)).For(TestConditions.Reference);

        Assert.Equal(4, band.Minimum.Limit!.Value.Value, 9);
        Assert.Equal(600, band.Maximum.Limit!.Value.Value, 9);
        Assert.Equal(15 * Math.Pow(1.25, Math.Log(4.0 / 15) / Math.Log(1.5)), band.TypicalMinimum!.Limit!.Value.Value, 9);
        Assert.Equal(7.25, band.TypicalMinimum!.Limit!.Value.Value, 2);
    }

    [Fact]
    public void OutsideTheTable_TheEndRowsCarryInTheirOwnDirection()
    {
        var envelope = new CurveTableEnvelope(Table, Amperes.Of(32));
        var below = envelope.At(Amperes.Of(32)).For(TestConditions.Reference);
        var above = envelope.At(Amperes.Of(400)).For(TestConditions.Reference);

        Assert.Equal(600, below.Minimum.Limit!.Value.Value, 9);
        Assert.Null(below.Maximum.Limit);
        Assert.Equal(0.1, above.Maximum.Limit!.Value.Value, 9);
        Assert.True(above.Minimum.IsOpen);
    }

    [Fact]
    public void WhereTheMinimumReachesZero_TheDrawnLineFallsLinearly()
    {
        // Between (3, 4 s) and (10, 0 s): at 6.5, 4 + (0 - 4) x 3.5 / 7 = 2 s.
        var band = new CurveTableEnvelope(Table, Amperes.Of(32)).At(Amperes.Of(208)).For(TestConditions.Reference);

        Assert.Equal(2.0, band.TypicalMinimum!.Limit!.Value.Value, 9);
        Assert.True(band.Minimum.IsOpen);
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
