using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Tests.Quantities;

/// <summary>
/// Resistances are printed with the SI symbols (µΩ, MΩ; SI Brochure, 9th edition, Table 7 prefixes) and a precision the
/// instrument supports: insulation to three significant figures, contact to 0.1 µΩ below 1000 µΩ (common practice for
/// micro-ohm meter displays, no source).
/// </summary>
public sealed class ResistanceTextTests
{
    [Theory]
    [InlineData(2297.4, "2300 MΩ")]
    [InlineData(997, "997 MΩ")]
    [InlineData(4512, "4510 MΩ")]
    [InlineData(25, "25 MΩ")]
    [InlineData(0.5, "0.5 MΩ")]
    [InlineData(0.51234, "0.512 MΩ")]
    [InlineData(16384.2, "16400 MΩ")]
    public void Insulation_HasThreeSignificantFigures(double megaOhms, string expected) =>
        Assert.Equal(expected, ResistanceText.MegaOhms(megaOhms));

    [Theory]
    [InlineData(15158, "15158 µΩ")]
    [InlineData(6750, "6750 µΩ")]
    [InlineData(99.64, "99.6 µΩ")]
    [InlineData(8.424, "8.42 µΩ")]
    public void Contact_IsInMicroOhms(double microOhms, string expected) =>
        Assert.Equal(expected, ResistanceText.MicroOhms(microOhms));

    [Fact]
    public void TheQuantities_PrintTheSameWay()
    {
        Assert.Equal("2300 MΩ", MegaOhms.Of(2297.4).ToString());
        Assert.Equal("99.6 µΩ", MicroOhms.Of(99.64).ToString());
    }
}
