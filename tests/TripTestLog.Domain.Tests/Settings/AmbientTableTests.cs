using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Tests.Settings;

/// <summary>Ambient derating tables: linear between rows (this tool's documented choice), nothing outside.</summary>
public sealed class AmbientTableTests
{
    private static readonly AmbientTable Table = AmbientTable.Create("A", [
        new(Celsius.Of(20), 1.08), new(Celsius.Of(40), 1.00), new(Celsius.Of(60), 0.90),
    ]);

    [Theory]
    [InlineData(20, 1.08)]
    [InlineData(30, 1.04)]
    [InlineData(50, 0.95)]
    [InlineData(60, 0.90)]
    public void TheFactor_IsLinearBetweenRows(double celsius, double expected)
    {
        Assert.Equal(expected, Table.FactorAt(Celsius.Of(celsius))!.Value, 9);
    }

    [Fact]
    public void OutsideTheTable_ThereIsNoFactor()
    {
        Assert.Null(Table.FactorAt(Celsius.Of(10)));
        Assert.Null(Table.FactorAt(Celsius.Of(61)));
    }

    [Fact]
    public void FallingTemperatures_AreRefused()
    {
        Assert.Throws<ArgumentException>(() => AmbientTable.Create("B", [new(Celsius.Of(40), 1.0), new(Celsius.Of(30), 1.04)]));
    }
}
