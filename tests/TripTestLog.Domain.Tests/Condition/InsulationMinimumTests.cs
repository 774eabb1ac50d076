using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Tests.Condition;

/// <summary>The insulation minimums of the two tables a lab can choose.</summary>
public sealed class InsulationMinimumTests
{
    [Theory]
    // ANSI/NETA maintenance table (from memory, not checked against the text): up to 250 V at 500 V DC, 25 MOhm;
    // up to 600 V at 1000 V DC, 100 MOhm; up to 1000 V at 1000 V DC, 100 MOhm.
    [InlineData(230, 500, 25)]
    [InlineData(250, 500, 25)]
    [InlineData(400, 1000, 100)]
    [InlineData(600, 1000, 100)]
    [InlineData(690, 1000, 100)]
    [InlineData(1000, 1000, 100)]
    public void Neta_MinimumByRatedVoltageClass(double rated, double testVoltage, double minimum)
    {
        var row = InsulationMinimum.For(InsulationTable.NetaMaintenance, Volts.Of(rated))!;

        Assert.Equal((testVoltage, minimum), (row.TestVoltage.Value, row.Minimum.Value));
        Assert.Contains("from memory", row.Source);
    }

    [Theory]
    // IEC 60364-6 Table 6.1: SELV/PELV 250 V DC 0.5 MOhm; up to 500 V, 500 V DC 1 MOhm; above 500 V, 1000 V DC 1 MOhm.
    [InlineData(24, 250, 0.5)]
    [InlineData(230, 500, 1)]
    [InlineData(400, 500, 1)]
    [InlineData(690, 1000, 1)]
    public void Iec60364_InstallationMinimums(double rated, double testVoltage, double minimum)
    {
        var row = InsulationMinimum.For(InsulationTable.Iec60364Installation, Volts.Of(rated))!;

        Assert.Equal((testVoltage, minimum), (row.TestVoltage.Value, row.Minimum.Value));
    }

    [Fact]
    public void AboveTheTables_ThereIsNoMinimum() =>
        Assert.Null(InsulationMinimum.For(InsulationTable.NetaMaintenance, Volts.Of(3300)));
}
