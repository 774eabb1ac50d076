using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Verdicts;
using static TripTestLog.Domain.Tests.Verdicts.TripJudgeTests;

namespace TripTestLog.Domain.Tests.Verdicts;

/// <summary>
/// Between the rows of IEC 60898-1 Table 7 a failure rests only on a guaranteed edge: row c's "1 s &lt; t" carried to
/// lower currents by I²t (a thermal release needs at least the same I²t at a lower current: t &gt; 1 s (2.55 In / I)²),
/// or a row carried in its own direction. The log-log lines between rows are this tool's drawing and raise advisories.
/// </summary>
public sealed class DrawnEdgeTests
{
    [Fact]
    public void AC16TrippingAt200sAt145InFromCold_Passes_WithAnAdvisory()
    {
        // The drawn a-c minimum at 1.45 In is 293 s; the guaranteed one is (2.55 / 1.45)² = 3.09 s.
        var a = Judge(TripCurve.C, 16, 23.2, Tripped(200), StartCondition.Cold);

        Assert.Equal(Verdict.Pass, a.Verdict);
        Assert.Equal(3.0927, a.Band.Minimum.Limit!.Value.Value, 4);
        Assert.Equal(EdgeSource.Derived, a.Band.Minimum.Source);
        var advisory = Assert.Single(a.Advisories);
        Assert.Equal(BandSide.Minimum, advisory.Side);
        Assert.Equal(293.4, advisory.Edge.Limit!.Value.Value, 0);
    }

    [Theory]
    // At 2.0 In the guaranteed minimum is 1 s x (2.55 / 2.0)² = 1.625625 s (by hand).
    [InlineData(1.62, Verdict.TooEarly)]
    [InlineData(1.63, Verdict.Pass)]
    [InlineData(5.0, Verdict.Pass)]
    public void Below255In_TheI2tOfRowC_IsTheGuaranteedMinimum(double tripSeconds, Verdict expected)
    {
        var a = Judge(TripCurve.C, 16, 32, Tripped(tripSeconds), StartCondition.Cold);

        Assert.Equal(expected, a.Verdict);
        Assert.Equal(1.625625, a.Band.Minimum.Limit!.Value.Value, 9);
    }

    [Theory]
    // At 4 In (curve C) row c's "t < 60 s" carries upward; the drawn I²t line from c gives 60 (2.55 / 4)² = 24.4 s.
    [InlineData(30, Verdict.Pass, 1)]
    [InlineData(20, Verdict.Pass, 0)]
    [InlineData(60, Verdict.TooLate, 0)] // an advisory only ever qualifies a pass
    public void Above255In_RowCCarriesUpward_AndTheI2tLineOnlyAdvises(double tripSeconds, Verdict expected, int advisories)
    {
        var a = Judge(TripCurve.C, 16, 64, Tripped(tripSeconds), StartCondition.Cold);

        Assert.Equal(expected, a.Verdict);
        Assert.Equal(60, a.Band.Maximum.Limit!.Value.Value, 9);
        Assert.Equal(24.384, a.Band.TypicalMaximum!.Limit!.Value.Value, 3);
        Assert.Equal(advisories, a.Advisories.Count);
    }

    [Fact]
    public void BetweenRowsBAndC_AColdTestHasNoGuaranteedMaximum()
    {
        // Row b starts warm; from cold nothing requires a trip between 1.45 and 2.55 In, so a 400 s trip at 2 In breaks
        // nothing and proves nothing (row c's 60 s is stated at 2.55 In).
        var a = Judge(TripCurve.C, 16, 32, Tripped(400), StartCondition.Cold);

        Assert.Equal(Verdict.NotAssessable, a.Verdict);
        Assert.Contains("nearest point is c", a.Reason);
        Assert.Null(a.Band.Maximum.Limit);
    }

    [Fact]
    public void Margin_IsThePositionInLogTimeAndTheDecadesToTheNearerEdge()
    {
        // Row c band for 16 A: 1 s to 60 s. By hand: log10(6) / log10(60) = 0.4376; nearer edge is the minimum, 0.778 decades away.
        var a = Judge(TripCurve.C, 16, 40.8, Tripped(6), StartCondition.Cold);

        Assert.Equal(0.4376, a.Margin.PositionInBand!.Value, 1e-4);
        Assert.Equal(0.7782, a.Margin.DecadesToNearerEdge!.Value, 1e-4);
        Assert.Equal(BandSide.Minimum, a.Margin.NearerEdge);
    }

    [Fact]
    public void Margin_IsNegativeOutsideTheBand()
    {
        var a = Judge(TripCurve.C, 16, 40.8, Tripped(120), StartCondition.Cold);

        Assert.Equal(-Math.Log10(2), a.Margin.DecadesToNearerEdge!.Value, 1e-9);
        Assert.Equal(BandSide.Maximum, a.Margin.NearerEdge);
    }
}
