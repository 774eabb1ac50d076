using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Domain.Tests.Trends;

/// <summary>The drift measure, on log time and as a move within the band, worked by hand.</summary>
public sealed class TripDriftTests
{
    [Fact]
    public void DriftFrom24_7To52_4Seconds_InRowCsBand_IsAThirdOfADecade_AndAFifthOfTheBand()
    {
        // IEC 60898-1 Table 7 row c for In <= 32 A: 1 s < t < 60 s. Position on a log axis: log10(t / 1) / log10(60 / 1).
        // log10(24.7) / log10(60) = 1.392697 / 1.778151 = 0.783227; log10(52.4) / 1.778151 = 0.966921.
        // log10(52.4 / 24.7) = 0.326634 decades = +112.146 % in time; the position moves by 0.183693.
        var p0 = Math.Log10(24.7) / Math.Log10(60);
        var p1 = Math.Log10(52.4) / Math.Log10(60);

        var drift = TripDrift.Between(Seconds.Of(24.7), p0, Seconds.Of(52.4), p1);

        Assert.Equal(0.326634, drift.Decades, 6);
        Assert.Equal(112.1457, drift.TimeChangePercent, 4);
        Assert.Equal(0.183693, drift.PositionShift!.Value, 6);
    }

    [Fact]
    public void Drift_IsSymmetricOnLogTime_AndHasNoBandMove_WithoutBothPositions()
    {
        var slower = TripDrift.Between(Seconds.Of(10), null, Seconds.Of(20), 0.5);
        var faster = TripDrift.Between(Seconds.Of(20), null, Seconds.Of(10), 0.5);

        Assert.Equal(-slower.Decades, faster.Decades, 12);
        Assert.Equal((100.0, -50.0), (Math.Round(slower.TimeChangePercent, 9), Math.Round(faster.TimeChangePercent, 9)));
        Assert.Null(slower.PositionShift);
    }
}
