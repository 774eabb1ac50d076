using System.Globalization;
using TripTestLog.Cli.Output;

namespace TripTestLog.Cli.Tests;

/// <summary>The numbers the JSON and CSV writers put out: measured ones as read, computed ones to a stated precision.</summary>
public sealed class NumberFormatTests
{
    [Theory]
    [InlineData(9.8, 1000, "0.0098")] // 9.8 ms read from a trip_time_ms column
    [InlineData(1534.903, 1, "1534.903")]
    [InlineData(40.9, 1, "40.9")]
    public void AMeasuredValue_IsWrittenAsItWasRead_WithoutConversionNoise(double read, double divisor, string expected) =>
        Assert.Equal(expected, Format.Measured(read / divisor).ToString("R", CultureInfo.InvariantCulture));

    [Theory]
    [InlineData(170.4142011834319, "170.414")]
    [InlineData(0.000123456789, "0.000123457")]
    [InlineData(1234567.8, "1234570")]
    [InlineData(3600, "3600")]
    public void AComputedValue_IsRoundedToSixSignificantDigits(double value, string expected) =>
        Assert.Equal(expected, Format.Significant(value, 6).ToString("R", CultureInfo.InvariantCulture));
}
