using TripTestLog.Cli.Output;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// The one text-table writer: declared columns two spaces apart under a rule of dashes, measured from the rows or fixed
/// up front and streamed, kept within a 100-column terminal by the one column that may shorten its cells.
/// </summary>
public sealed class TextTableTests
{
    [Fact]
    public void ARightAlignedColumn_PadsItsCellsOnTheLeft_AndALeftAlignedOneOnTheRight()
    {
        var table = new TextTable(TextColumn.Left("name"), TextColumn.Right("count"));
        table.Add("a", "7");
        table.Add("longer", "1234");

        Assert.Equal(
        [
            "name    count",
            "------  -----",
            "a           7",
            "longer   1234",
        ], Lines(table));
    }

    [Fact]
    public void AHeaderWithALineBreak_IsPrintedOverTwoLines_AndAOneLineHeaderSitsOnTheLast()
    {
        var table = new TextTable(TextColumn.Left("site"), TextColumn.Right("take-out-\nof-service"));
        table.Add("North", "3");

        Assert.Equal(
        [
            "        take-out-",
            "site   of-service",
            "-----  ----------",
            "North           3",
        ], Lines(table));
    }

    [Fact]
    public void ATooWideTable_ShortensItsFirstColumnFromTheFront_SoTheEndOfAPathStays_Within100Columns()
    {
        var path = "records/" + new string('x', 110) + "/2026-trip-tests.csv";
        var table = new TextTable(TextColumn.Left("File", shortening: Shortening.Front), TextColumn.Right("Records"));
        table.Add(path, "12");
        table.Add("short.csv", "3");

        var lines = Lines(table);

        Assert.All(lines, l => Assert.True(l.Length <= 100, l));
        Assert.Equal(100, lines[2].Length);
        var shown = lines[2][..91];
        Assert.Equal("…" + path[^90..], shown);
        Assert.StartsWith("short.csv  ", lines[3], StringComparison.Ordinal);
    }

    [Fact]
    public void ATooWideTable_ShortensAnotherElasticColumnAtItsEnd_SoItsBeginningStays_Within100Columns()
    {
        var settings = "Ir 500 A, tr 10 s at 6 Ir, Isd 3000 A, tsd 200 ms, Ii 6000 A, " + string.Concat(Enumerable.Repeat("and more ", 10));
        var table = new TextTable(TextColumn.Left("Asset"), TextColumn.Left("Settings", shortening: Shortening.End), TextColumn.Right("Poles"));
        table.Add("ARW-MSB-Q01", settings, "3");

        var row = Lines(table)[2];

        Assert.Equal(100, row.Length);
        var cell = row[13..^7];
        Assert.Equal(settings[..(cell.Length - 1)] + "…", cell);
        Assert.EndsWith("      3", row, StringComparison.Ordinal);
    }

    [Fact]
    public void ATableThatFits_IsNotShortened_AndAColumnWithoutARulePushesItsRowOut()
    {
        var table = new TextTable(TextColumn.Left("due", 10), TextColumn.Left("why", shortening: Shortening.End));
        table.Add("2026-12-01 (overdue)", "fits");

        Assert.Equal("2026-12-01 (overdue)  fits", Lines(table)[2]);
    }

    [Fact]
    public void AStreamedTable_WritesEachRowAsItComes_AtItsDeclaredWidths_AndNothingBeforeTheFirstRow()
    {
        var output = new StringWriter();
        var rows = new TextTable(TextColumn.Left("Asset", 11, Shortening.Middle), TextColumn.Right("Multiple", 8), TextColumn.Left("Verdict", 9))
            .StreamTo(output);

        Assert.Equal("", output.ToString());
        rows.Add("ARW-DB1-Q01", "2.55 In", "pass");
        var afterFirst = output.ToString();
        rows.Add("NORTHFIELD-SUBSTATION-PANEL-07-FEEDER-Q1", "10.00 In", "too-late");

        Assert.Equal(
        [
            "Asset        Multiple  Verdict",
            "-----------  --------  ---------",
            "ARW-DB1-Q01   2.55 In  pass",
        ], afterFirst.ReplaceLineEndings("\n").TrimEnd('\n').Split('\n'));
        Assert.EndsWith("NOR…EDER-Q1  10.00 In  too-late" + Environment.NewLine, output.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void AStreamedTable_NeedsEveryColumnToDeclareItsWidth() =>
        Assert.Throws<InvalidOperationException>(() => new TextTable(TextColumn.Left("a", 4), TextColumn.Left("b")).StreamTo(new StringWriter()));

    [Fact]
    public void ControlCharacters_AreShownAsCodes_AndTheColumnIsMeasuredAsShown()
    {
        var table = new TextTable(TextColumn.Left("site"), TextColumn.Right("n"));
        table.Add("a\u001b[2Jb", "1");
        table.Add("plain", "2");

        var lines = Lines(table);

        Assert.DoesNotContain(lines, l => l.Contains('\u001b', StringComparison.Ordinal));
        Assert.Equal("a\\x1b[2Jb  1", lines[2]);
        Assert.Equal("plain      2", lines[3]);
        Assert.Equal("---------  -", lines[1]);
    }

    [Fact]
    public void ARowWithTheWrongNumberOfCells_IsRefused_BufferedOrStreamed()
    {
        var columns = new[] { TextColumn.Left("a", 3), TextColumn.Left("b", 3) };

        Assert.Throws<ArgumentException>(() => new TextTable(columns).Add("only one"));
        Assert.Throws<ArgumentException>(() => new TextTable(columns).Add("one", "two", "three"));
        Assert.Throws<ArgumentException>(() => new TextTable(columns).StreamTo(new StringWriter()).Add("only one"));
    }

    [Fact]
    public void MoreThanOneColumnThatShortens_IsRefused() =>
        Assert.Throws<ArgumentException>(() => new TextTable(
            TextColumn.Left("a", shortening: Shortening.Front), TextColumn.Left("b", shortening: Shortening.End)));

    [Fact]
    public void ARowsNote_IsWrittenBeneathIt_IndentedToTheSecondColumn()
    {
        var table = new TextTable(TextColumn.Right("#"), TextColumn.Left("asset"));
        table.Add(["1", "CWD-DB1-Q07"], "insulation below minimum");

        Assert.Equal("   insulation below minimum", Lines(table)[3]);
    }

    private static string[] Lines(TextTable table)
    {
        var output = new StringWriter();
        table.WriteTo(output);
        return output.ToString().ReplaceLineEndings("\n").TrimEnd('\n').Split('\n');
    }
}
