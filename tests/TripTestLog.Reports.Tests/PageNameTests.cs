using TripTestLog.Reports.Html;

namespace TripTestLog.Reports.Tests;

/// <summary>A device page's file name is safe on every system, and two tags never share one.</summary>
public sealed class PageNameTests
{
    // Reserved device names: Microsoft, "Naming Files, Paths, and Namespaces", naming conventions (CON, PRN, AUX, NUL,
    // COM0-COM9, LPT0-LPT9, in any case, also when followed by an extension).
    [Theory]
    [InlineData("CON")]
    [InlineData("con")]
    [InlineData("NUL")]
    [InlineData("AUX")]
    [InlineData("PRN")]
    [InlineData("COM1")]
    [InlineData("LPT1")]
    [InlineData("lpt9")]
    [InlineData("NUL.A")]
    public void AReservedDeviceName_GetsAPageNameOfItsOwn(string tag)
    {
        var page = Markup.PageName(tag);

        Assert.NotEqual(tag + ".html", page);
        Assert.Matches("^[A-Za-z0-9_.-]+-[0-9a-f]{8}\\.html$", page);
        Assert.NotEqual(Markup.PageName(tag + "x"), page);
    }

    [Theory]
    [InlineData("CONSOLE-1")]
    [InlineData("COM10")]
    [InlineData("BPS-DB1-Q03")]
    public void AnOrdinaryTag_KeepsItsOwnName(string tag) => Assert.Equal(tag + ".html", Markup.PageName(tag));

    [Fact]
    public void TwoReservedSpellings_NeverSharePage() => Assert.NotEqual(Markup.PageName("CON"), Markup.PageName("con"));
}
