using System.Globalization;

namespace TripTestLog.Cli.Tests;

/// <summary>`envelope` prints the band; its CSV is a stable, documented format.</summary>
public sealed class EnvelopeCommandTests
{
    [Fact]
    public void CurveC16A_Table_MatchesTheGoldenFile()
    {
        var (exit, output, _) = CliRun.Run("envelope", "--curve", "C", "--rated", "16");

        Assert.Equal(0, exit);
        Golden.Matches("envelope-c16.txt", output);
    }

    [Fact]
    public void Csv_HasTheTablePointsOfIec60898Table7()
    {
        // IEC 60898-1:2015 Table 7 for curve B, In = 40 A (> 32 A: 120 s at 2.55 In; <= 63 A: 1 h at 1.13 and 1.45 In).
        // Row b starts warm, so its 1 h limit shows in the band for a warm test.
        var (exit, output, _) = CliRun.Run("envelope", "--curve", "B", "--rated", "40", "--csv");
        var (_, warm, _) = CliRun.Run("envelope", "--curve", "B", "--rated", "40", "--csv", "--start", "warm");

        Assert.Equal(0, exit);
        var rows = output.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => l.Split(',')).ToList();
        Assert.Equal("multiple,current_a,min_s,max_s,min_source,max_source,point,typical_min_s,typical_max_s", string.Join(',', rows[0]));
        var byPoint = rows.Skip(1).Where(r => r[6].Length > 0).ToDictionary(r => r[6]);
        var warmB = warm.Split('\n').Select(l => l.Split(',')).Single(r => r.Length > 6 && r[6] == "b");
        Assert.Equal("3600", byPoint["a"][2]);
        Assert.Equal("", byPoint["b"][3]);
        Assert.Equal("3600", warmB[3]);
        Assert.Equal(("1", "120"), (byPoint["c"][2], byPoint["c"][3]));
        Assert.Equal(("3", "0.1"), (byPoint["d"][0], byPoint["d"][2]));
        Assert.Equal(("5", "0.1"), (byPoint["e"][0], byPoint["e"][3]));
        Assert.Equal(40 * 2.55, double.Parse(byPoint["c"][1], CultureInfo.InvariantCulture), 9);
    }

    [Fact]
    public void RelayIdmt_Csv_HasTheCharacteristicAtTenTimesPickup()
    {
        // IEC 60255-151 standard inverse, TMS 0.1, 10 x 200 A: 0.29706 s, ±40 ms (lab policy floor) = 0.25706 s to 0.33706 s.
        var (exit, output, _) = CliRun.Run("envelope", "--family", "relay-idmt", "--curve", "standard-inverse", "--pickup", "200", "--tms", "0.1", "--csv");

        Assert.Equal(0, exit);
        var row = output.Split('\n').Select(l => l.Split(',')).Single(r => r[0] == "10");
        Assert.Equal(("2000", "0.25706", "0.33706", "characteristic"), (row[1], row[2], row[3], row[4]));
    }

    [Fact]
    public void Electronic_Table_MatchesTheGoldenFile()
    {
        var (exit, output, _) = CliRun.Run("envelope", "--family", "iec60947-electronic", "--rated", "630", "--ir", "400", "--tr", "10",
            "--isd", "2400", "--tsd", "0.2", "--ii", "4800");

        Assert.Equal(0, exit);
        Golden.Matches("envelope-electronic.txt", output);
    }

    [Fact]
    public void ThermalMagnetic_CarriesThe130IrLimitUpward_ForAWarmStartOnly()
    {
        // IEC 60947-2 (from memory): 1.30 Ir, straight after the 1.05 Ir test, trip within 2 h (In > 63 A).
        var (exit, cold, _) = CliRun.Run("envelope", "--family", "iec60947-thermal-magnetic", "--rated", "160", "--ir", "125", "--im", "1250", "--csv");
        var (_, warm, _) = CliRun.Run("envelope", "--family", "iec60947-thermal-magnetic", "--rated", "160", "--ir", "125", "--im", "1250", "--csv", "--start", "warm");

        Assert.Equal(0, exit);
        var coldRow = cold.Split('\n').Select(l => l.Split(',')).Single(r => r[0] == "3");
        var warmRow = warm.Split('\n').Select(l => l.Split(',')).Single(r => r[0] == "3");
        // From cold only the magnetic release's "no operation within 0.2 s at 0.8 Im" (carried down) bounds it.
        Assert.Equal(("0.2", "", "none"), (coldRow[2], coldRow[3], coldRow[5]));
        Assert.Equal(("7200", "normative"), (warmRow[3], warmRow[5]));
    }

    [Fact]
    public void CurveTable_IsDrawnFromAFile()
    {
        var sample = Path.Combine(Golden.RepositoryRoot(), "sample-records", "curve-tables.csv");
        var file = Path.Combine(Path.GetTempPath(), $"ttl-one-table-{Guid.NewGuid():N}.csv");
        File.WriteAllLines(file, File.ReadLines(sample).Where(l => !l.StartsWith("CV-M32-SPECIAL,", StringComparison.Ordinal)));

        var (exit, output, error) = CliRun.Run("envelope", "--family", "curve-table", "--rated", "160", "--table", file, "--csv");
        var (twoExit, _, twoError) = CliRun.Run("envelope", "--family", "curve-table", "--rated", "160", "--table", sample, "--csv");
        File.Delete(file);

        Assert.True(exit == 0, error);
        Assert.Contains("2,320,40,400,curve-table,curve-table,", output);
        Assert.Equal(2, twoExit);
        Assert.StartsWith("error: --table: curve-tables.csv holds 2 tables (HB-TM160-CURVE, CV-M32-SPECIAL); give a file with the one table to draw", CliRun.Unwrapped(twoError));
    }

    [Theory]
    [InlineData(new[] { "--curve", "C", "--rated", "16", "--tms", "0.1" }, "error: --tms does not apply to iec60898; it applies to relay-idmt")]
    [InlineData(new[] { "--family", "relay-idmt", "--curve", "standard-inverse", "--pickup", "200", "--tms", "0.1", "--rated", "400" },
        "error: --rated does not apply to relay-idmt")]
    [InlineData(new[] { "--family", "iec60947-thermal-magnetic", "--rated", "160", "--ir", "125", "--im", "1000", "--isd", "900" },
        "error: --isd does not apply to iec60947-thermal-magnetic")]
    [InlineData(new[] { "--curve", "C", "--rated", "16", "--on", "2024-01-01" }, "error: --on applies with --asset")]
    public void AnOptionThatDoesNotApply_IsRefused_NotIgnored(string[] args, string expected)
    {
        var (exit, _, error) = CliRun.Run(["envelope", .. args]);

        Assert.Equal(2, exit);
        Assert.StartsWith(expected, error);
    }

    [Theory]
    [InlineData("--family", "relay-idmt", "--curve", "sideways", "--pickup", "200", "--tms", "0.1", "--rated", "400")]
    [InlineData("--family", "iec60947-electronic", "--rated", "630", "--ir", "400")]
    [InlineData("--family", "iec60947-thermal-magnetic", "--rated", "160", "--ir", "125", "--im", "100")]
    [InlineData("--curve", "E", "--rated", "16")]
    [InlineData("--curve", "C", "--rated", "-3")]
    [InlineData("--curve", "C")]
    [InlineData("--family", "unknown", "--curve", "C", "--rated", "16")]
    [InlineData("--curve", "D", "--rated", "16", "--supply", "dc")]
    [InlineData("--curve", "C", "--rated", "16", "--start", "tepid")]
    [InlineData("--curve", "C", "--rated", "16", "--poles", "5")]
    public void BadSettings_AreRefusedWithExitCode2(params string[] args)
    {
        var (exit, _, error) = CliRun.Run(["envelope", .. args]);

        Assert.Equal(2, exit);
        Assert.StartsWith("error:", error);
    }
}
