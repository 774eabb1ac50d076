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
    // The halving-per-10-K rule of thumb: 100 MOhm read at 30 C is 200 at 20 C; read at 10 C it is 50; at 25 C, 141.42.
    [InlineData(30, 200.0)]
    [InlineData(10, 50.0)]
    [InlineData(25, 141.4214)]
    public void Insulation_ReferredTo20C_HalvesPerTenKelvin(double celsius, double expected) =>
        Assert.Equal(expected, InsulationCorrection.ToTwentyCelsius(MegaOhms.Of(100), Celsius.Of(celsius)).Value, 4);
}
