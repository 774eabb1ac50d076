using System.Text.Json;

namespace TripTestLog.Cli.Tests;

/// <summary>`check`'s filters and CSV on the sample fleet: each shows exactly the tests the unfiltered output holds that match.</summary>
public sealed class CheckFilterTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    private List<JsonElement> Check(params string[] args)
    {
        var (exit, output, error) = CliRun.Run(["check", "--json", "--db", fleet.Database, .. args]);
        Assert.True(exit == 0, error);
        return JsonDocument.Parse(output).RootElement.EnumerateArray().ToList();
    }

    private static string Text(JsonElement row, string field) => row.GetProperty(field).GetString()!;

    [Fact]
    public void EachFilter_ShowsExactlyTheMatchingTests()
    {
        var all = Check();

        var failures = Check("--verdict", "too-early,too-late");
        var relays = Check("--family", "relay-idmt");
        var depot = Check("--site", "copperwell depot");
        var asFound = Check("--stage", "as-found");
        var year = Check("--from", "2025-01-01", "--to", "2025-12-31");

        Assert.NotEmpty(failures);
        Assert.Equal(all.Count(r => Text(r, "verdict") is "too-early" or "too-late"), failures.Count);
        Assert.Equal(all.Count(r => Text(r, "family") == "relay-idmt"), relays.Count);
        Assert.NotEmpty(relays);
        Assert.Equal(all.Count(r => Text(r, "asset_tag").StartsWith("CWD-", StringComparison.Ordinal)), depot.Count);
        Assert.NotEmpty(depot);
        // The sample trip records are all as-found, so the stage filter is shown keeping every one.
        Assert.Equal(all.Count(r => Text(r, "stage") == "as-found"), asFound.Count);
        Assert.Equal(all.Count, asFound.Count);
        Assert.Empty(Check("--stage", "as-left"));
        Assert.Equal(all.Count(r => Text(r, "tested_at").StartsWith("2025-", StringComparison.Ordinal)), year.Count);
        Assert.NotEmpty(year);
    }

    [Fact]
    public void Csv_HasTheJsonFields_AndARowPerTest()
    {
        var json = Check("--asset", "ARW-MSB-Q01");

        var (exit, output, _) = CliRun.Run("check", "--csv", "--asset", "ARW-MSB-Q01", "--db", fleet.Database);

        Assert.Equal(0, exit);
        var lines = output.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(string.Join(',', json[0].EnumerateObject().Select(p => p.Name)), lines[0]);
        Assert.Equal(json.Count, lines.Length - 1);
    }

    [Theory]
    [InlineData(new[] { "--verdict", "fail" }, "error: --verdict: 'fail' is not a verdict")]
    [InlineData(new[] { "--from", "2025-06-01", "--to", "2025-01-01" }, "error: --from 2025-06-01 is after --to 2025-01-01")]
    [InlineData(new[] { "--stage", "found" }, "error: --stage: 'found' is not a stage")]
    [InlineData(new[] { "--family", "mccb" }, "error: --family: 'mccb' is not a family")]
    [InlineData(new[] { "--json", "--csv" }, "error: --json and --csv: choose one")]
    public void ABadFilter_GetsOnePlainSentence(string[] args, string expected)
    {
        var (exit, output, error) = CliRun.Run(["check", "--db", fleet.Database, .. args]);

        Assert.Equal(2, exit);
        Assert.StartsWith(expected, error);
        Assert.DoesNotContain("   at ", error + output);
    }

    [Fact]
    public void Envelope_On_DrawsTheSettingsInForceThatDay()
    {
        // The register gives ARW-MSB-Q01 Ir 400 A from commissioning and Ir 500 A from 2023-02-01.
        var (_, then, _) = CliRun.Run("envelope", "--asset", "ARW-MSB-Q01", "--db", fleet.Database, "--on", "2022-06-01");
        var (_, now, _) = CliRun.Run("envelope", "--asset", "ARW-MSB-Q01", "--db", fleet.Database);

        Assert.Contains("Ir 400 A", then);
        Assert.Contains("settings in force on 2022-06-01", then);
        Assert.Contains("Ir 500 A", now);
    }

    [Fact]
    public void EveryRunAgainstADatabase_LeavesALineInItsLog()
    {
        var marker = $"--from 2020-01-0{DateTime.UtcNow.Second % 9 + 1}";
        var args = marker.Split(' ');

        CliRun.Run(["check", "--db", fleet.Database, "--asset", "ARW-DB1-Q01", .. args]);
        CliRun.Run(["verify", "--db", fleet.Database]);
        CliRun.Run(["check", "--db", fleet.Database, "--verdict", "sideways"]);

        var log = File.ReadAllText(Path.Combine(fleet.Folder, "triptestlog.log"));
        Assert.Contains($"ran: triptestlog check --db {fleet.Database} --asset ARW-DB1-Q01 {marker}; exit 0 (done)", log);
        Assert.Contains($"ran: triptestlog verify --db {fleet.Database}; exit", log);
        Assert.Contains($"ran: triptestlog check --db {fleet.Database} --verdict sideways; exit 2 (bad usage or input)", log);
    }
}
