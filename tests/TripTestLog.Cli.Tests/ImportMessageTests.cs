namespace TripTestLog.Cli.Tests;

/// <summary>
/// Problems of one cause are said once, with how many more rows share it and on which lines; decimal commas in a
/// comma-separated file get one message that says what to do; an unknown tag names the register's nearest tag.
/// (Message design: common practice, no source. RFC 4180 section 2: a comma inside a field must be quoted.)
/// </summary>
public sealed class ImportMessageTests : IDisposable
{
    private const string TripHeader = "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note";

    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-messages-" + Guid.NewGuid().ToString("N")[..12]);

    public ImportMessageTests()
    {
        Directory.CreateDirectory(_folder);
        Write("register.csv",
            "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial",
            "FHM-DB3-Q01,Fernhill,Way 1,iec60898,C,16,1,230,2019-01-01,,,,",
            "FHM-DB3-Q02,Fernhill,Way 2,iec60898,C,16,1,230,2019-01-01,,,,",
            "FHM-DB3-Q05,Fernhill,Way 5,iec60898,C,16,1,230,2019-01-01,,,,");
        Assert.Equal(0, CliRun.Run("import", Path.Combine(_folder, "register.csv"), "--db", Database).Exit);
    }

    private string Database => Path.Combine(_folder, "records.db");

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void AnUnknownTagOnSixRows_IsOneMessage_NamingTheNearTag_AndTheLines()
    {
        // Rows 2-7 all carry the tag with a letter O for the zero of Q02 (one edit from FHM-DB3-Q02, two from Q01 and Q05).
        Write("unknown-tag.csv", [TripHeader, .. Enumerable.Range(0, 6).Select(i =>
            $"FHM-DB3-QO2,2026-03-06T0{i + 1}:00,as-found,all,{30 + i}.0,9.5,,cold,25,INJ-1,A. Tester,")]);

        var (exit, output, _) = CliRun.Run("import", Folder("unknown-tag.csv"), "--db", Database);

        Assert.Equal(2, exit);
        Golden.Matches("import-unknown-tag.txt", output);
        Assert.Single(System.Text.RegularExpressions.Regex.Matches(output, "'FHM-DB3-QO2'"));
        Assert.Contains("did you mean FHM-DB3-Q02?", Flat(output), StringComparison.Ordinal);
        Assert.Contains("and 5 more rows like it (lines 3-7)", Flat(output), StringComparison.Ordinal);
    }

    [Fact]
    public void AFarTag_GetsNoGuess()
    {
        Write("far-tag.csv", TripHeader, "NORTH-PANEL-7,2026-03-06T08:00,as-found,all,30.0,9.5,,cold,25,INJ-1,A. Tester,");

        var (_, output, _) = CliRun.Run("import", Folder("far-tag.csv"), "--db", Database);

        Assert.Contains("'NORTH-PANEL-7' is not in the device register", Flat(output), StringComparison.Ordinal);
        Assert.DoesNotContain("did you mean", output, StringComparison.Ordinal);
    }

    [Fact]
    public void DecimalCommasInACommaFile_AreOneMessage_ThatSaysWhatToDo()
    {
        // 30,5 A and 9,5 s written with decimal commas: each row splits into two more fields than the header has.
        Write("decimal-commas.csv", [TripHeader, .. Enumerable.Range(0, 9).Select(i =>
            $"FHM-DB3-Q01,2026-03-06T{10 + i}:00,as-found,all,30,5,9,5,,cold,25,INJ-1,A. Tester,")]);

        var (exit, output, _) = CliRun.Run("import", Folder("decimal-commas.csv"), "--db", Database);

        Assert.Equal(2, exit);
        Golden.Matches("import-decimal-commas.txt", output);
        Assert.Contains("and 8 more rows like it (lines 3-10)", Flat(output), StringComparison.Ordinal);
    }

    [Fact]
    public void QuotedDecimalCommas_AreRefusedPlainly_AndReadWithDecimalComma()
    {
        Write("quoted.csv", TripHeader,
            "FHM-DB3-Q01,2026-03-06T08:00,as-found,all,\"30,5\",\"9,5\",,cold,25,INJ-1,A. Tester,",
            "FHM-DB3-Q01,2026-03-06T09:00,as-found,all,\"80,2\",\"0,008\",,cold,25,INJ-1,A. Tester,");

        var (refused, refusal, _) = CliRun.Run("import", Folder("quoted.csv"), "--db", Database);
        var (exit, _, error) = CliRun.Run("import", Folder("quoted.csv"), "--db", Database, "--decimal", ",");
        refusal = Flat(refusal);
        var check = CliRun.Run("check", "--csv", "--asset", "FHM-DB3-Q01", "--db", Database).Out;

        Assert.Equal(2, refused);
        Assert.Contains("import it with --decimal ,", refusal, StringComparison.Ordinal);
        Assert.Contains("and 3 more values like it (lines 2-3)", refusal, StringComparison.Ordinal);
        Assert.True(exit == 0, error);
        Assert.Contains(",30.5,", check, StringComparison.Ordinal);
        Assert.Contains(",80.2,", check, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(new long[] { 4 }, "line 4")]
    [InlineData(new long[] { 4, 5, 6, 7, 8, 9 }, "lines 4-9")]
    [InlineData(new long[] { 9, 4, 5, 6, 12, 13, 14 }, "lines 4-6, 9, 12-14")]
    public void LineNumbers_AreWrittenAsRanges(long[] lines, string expected) =>
        Assert.Equal(expected, Output.ImportReport.Lines(lines));

    // Each record file in a folder of its own, imported by the folder, so problems cite it by its plain name.
    private void Write(string name, params string[] lines)
    {
        var folder = name == "register.csv" ? _folder : Folder(name);
        Directory.CreateDirectory(folder);
        File.WriteAllText(Path.Combine(folder, name), string.Join('\n', lines) + "\n");
    }

    private string Folder(string name) => Path.Combine(_folder, Path.GetFileNameWithoutExtension(name));

    private static string Flat(string text) => System.Text.RegularExpressions.Regex.Replace(text, @"\s+", " ");
}
