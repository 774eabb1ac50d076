using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Tests.Condition;

/// <summary>Temperature corrections of contact and insulation resistance to 20 °C.</summary>
public sealed class CorrectionTests
{
    [Theory]
    // IEC 60228's copper coefficient 0.00393 /K (from memory), and the same rule in its factor form 254.5 / (234.5 + t):
    // at 30 C, 100 / 1.0393 = 96.2186 and 25450 / 264.5 = 96.2193; at 5 C, 100 / 0.94105 = 106.2643 and 25450 / 239.5 = 106.2630.
    [InlineData(30, 96.2186)]
    [InlineData(5, 106.2643)]
    [InlineData(20, 100.0)]
    public void Copper_ReferredTo20C_Uses0_00393PerKelvin(double celsius, double expected)
    {
        var r20 = CopperCorrection.ToTwentyCelsius(MicroOhms.Of(100), Celsius.Of(celsius)).Value;

        Assert.Equal(expected, r20, 4);
        Assert.Equal(25450 / (234.5 + celsius), r20, 1);
    }

    [Theory]
    // The halving-per-10-K rule of thumb (common practice, no standard): 100 MOhm read at 30 C is 200 at 20 C; read at
    // 10 C it is 50; at 25 C, 141.42; at 40 C, x 4.
    [InlineData(30, 200.0)]
    [InlineData(10, 50.0)]
    [InlineData(25, 141.4214)]
    [InlineData(40, 400.0)]
    public void Insulation_ReferredTo20C_HalvesPerTenKelvin(double celsius, double expected) =>
        Assert.Equal(expected, InsulationCorrection.ToTwentyCelsius(MegaOhms.Of(100), Celsius.Of(celsius), InsulationCorrectionRule.HalvingPer10K).Value, 4);

    [Theory]
    // The solid-insulation columns of the conversion tables in maintenance use, referred to 20 C (from memory; no copy to
    // hand): x 0.40 at 0 C, x 1.25 at 25 C, x 1.58 at 30 C, x 2.50 at 40 C, x 3.98 at 50 C, x 10.0 at 70 C. The rule
    // tenfold per 50 K must meet every one of them to within 1 %.
    [InlineData(0, 0.40)]
    [InlineData(25, 1.25)]
    [InlineData(30, 1.58)]
    [InlineData(40, 2.50)]
    [InlineData(50, 3.98)]
    [InlineData(70, 10.0)]
    public void Insulation_SolidRule_MeetsTheSolidColumnWithinOnePercent(double celsius, double tableFactor)
    {
        var factor = InsulationCorrection.FactorAt(Celsius.Of(celsius), InsulationCorrectionRule.SolidInsulation);

        Assert.InRange(factor / tableFactor, 0.99, 1.01);
    }

    [Fact]
    // The same reading at 40 C is referred to 20 C as x 4 by halving per 10 K and x 2.5 by the solid column: the milder
    // rule gives the lower figure when hot, and both agree at 20 C.
    public void Insulation_SolidRule_IsMilderWhenHotThanHalving()
    {
        var hot = Celsius.Of(40);
        Assert.Equal(400, InsulationCorrection.ToTwentyCelsius(MegaOhms.Of(100), hot, InsulationCorrectionRule.HalvingPer10K).Value, 6);
        Assert.Equal(251.19, InsulationCorrection.ToTwentyCelsius(MegaOhms.Of(100), hot, InsulationCorrectionRule.SolidInsulation).Value, 2);
        Assert.Equal(100, InsulationCorrection.ToTwentyCelsius(MegaOhms.Of(100), hot, InsulationCorrectionRule.None).Value, 6);
        Assert.Equal(1, InsulationCorrection.FactorAt(Celsius.Of(20), InsulationCorrectionRule.SolidInsulation), 12);
    }
}
