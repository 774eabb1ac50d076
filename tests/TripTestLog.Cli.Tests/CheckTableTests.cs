namespace TripTestLog.Cli.Tests;

/// <summary>
/// The default check table tells per-pole rows and the tests of one day apart (pole and time of day), and a long asset
/// tag is shortened rather than pushing the table past 100 columns. The points: IEC 60898-1 Table 7, curve C, 2.55 In
/// from cold within 1 s to 60 s, and 10 In from cold within 0.1 s.
/// </summary>
public sealed class CheckTableTests : IDisposable
{
    private const string LongTag = "NORTHFIELD-SUBSTATION-PANEL-07-FEEDER-Q1";

    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-table-" + Guid.NewGuid().ToString("N")[..12]);

    public CheckTableTests()
    {
        Directory.CreateDirectory(_folder);
        File.WriteAllText(Path.Combine(_folder, "register.csv"),
            "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial\n"
            + $"{LongTag},Northfield,Bay 7,iec60898,C,16,3,400,2019-01-01,,,,\n");
        // One day, four tests: all poles at 2.55 In, then each pole alone at 10 In.
        File.WriteAllText(Path.Combine(_folder, "trips.csv"),
            "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note\n"
            + $"{LongTag},2026-03-06T08:00,as-found,all,40.8,20.5,,cold,30,INJ-1,A. Tester,\n"
            + $"{LongTag},2026-03-06T08:30,as-found,1,160,0.012,,cold,30,INJ-1,A. Tester,\n"
            + $"{LongTag},2026-03-06T08:40,as-found,2,160,0.013,,cold,30,INJ-1,A. Tester,\n"
            + $"{LongTag},2026-03-06T08:50,as-found,3,160,0.011,,cold,30,INJ-1,A. Tester,\n");
        var (exit, output, error) = CliRun.Run("import", _folder, "--db", Database);
        Assert.True(exit == 0, output + error);
    }

    private string Database => Path.Combine(_folder, "records.db");

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void PerPoleRows_AndTestsOfOneDay_AreToldApart_AndAFortyCharacterTagStaysWithin100Columns()
    {
        var (_, output, _) = CliRun.Run("check", "--db", Database);
        var rows = output.ReplaceLineEndings("\n").Split('\n').Where(l => l.StartsWith("NOR…", StringComparison.Ordinal)).ToList();

        Assert.Equal(40, LongTag.Length);
        Assert.Equal(4, rows.Count);
        Assert.Equal(4, rows.Distinct().Count());
        Assert.All(output.ReplaceLineEndings("\n").Split('\n'), l => Assert.True(l.Length <= 100, l));
        Assert.Contains(rows, r => r.Contains("2026-03-06 08:40  2 ", StringComparison.Ordinal));
        Golden.Matches("check-long-tag.txt", output.Split("\nCaution:")[0]);
    }

    [Fact]
    public void Wide_KeepsTheWholeTag() =>
        Assert.Contains(LongTag, CliRun.Run("check", "--db", Database, "--wide").Out, StringComparison.Ordinal);

    [Theory]
    [InlineData("ARW-DB1-Q01", "ARW-DB1-Q01")]
    [InlineData("NORTHFIELD-SUBSTATION-PANEL-07-FEEDER-Q1", "NOR…EDER-Q1")]
    public void ATagIsShortenedInItsMiddle(string tag, string expected) =>
        Assert.Equal(expected, Output.VerdictTable.Shortened(tag, 11));
}
