using System.Text.Json;

namespace TripTestLog.Cli.Tests;

/// <summary>`report` on the sample fleet and on hostile register data: files written, data escaped, companions beside.</summary>
public sealed class ReportCommandTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    [Fact]
    public void TheSampleReport_HasAFleetPage_APagePerDevice_AndTheCompanions()
    {
        var folder = Path.Combine(fleet.Folder, "report-test");

        var (exit, output, _) = CliRun.Run("report", "--db", fleet.Database, "--out", folder);

        Assert.Equal(0, exit);
        Assert.Contains($"Fleet page: {Path.Combine(folder, "index.html")}", output);
        Assert.Equal(58, Directory.GetFiles(Path.Combine(folder, "devices"), "*.html").Length);
        var index = File.ReadAllText(Path.Combine(folder, "index.html"));
        Assert.Contains("href=\"devices/BPS-DB1-Q03.html\"", index);
        Assert.Contains("Caution:", index);
        Assert.DoesNotContain("http://", index.Replace("http://www.w3.org/", "", StringComparison.Ordinal), StringComparison.Ordinal);
        var device = File.ReadAllText(Path.Combine(folder, "devices", "ARW-DB2-Q02.html"));
        Assert.Contains("Sign-off", device);
        Assert.Contains("OHM-ARW-1", device);
        Assert.Contains("Caution:", device);

        // The companions: the same fields as `findings --json` and `check --json`.
        var findings = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "findings.json"))).RootElement;
        Assert.Equal("asset_tag", findings[0].EnumerateObject().First().Name);
        var verdictsCsv = File.ReadLines(Path.Combine(folder, "verdicts.csv")).First();
        var checkFields = JsonDocument.Parse(CliRun.Run("check", "--json", "--asset", "ARW-DB1-Q01", "--db", fleet.Database).Out).RootElement[0]
            .EnumerateObject().Select(p => p.Name);
        Assert.Equal(string.Join(',', checkFields), verdictsCsv);
        Assert.Equal(2239, File.ReadLines(Path.Combine(folder, "verdicts.csv")).Count() - 1);
    }

    [Fact]
    public void TheReportsVerdictFiles_AreWhatCheckWritesAsCsvAndAsJson_RowForRow()
    {
        // The report makes each test's row once for both files: each must still be the check's own, test for test.
        var folder = Path.Combine(fleet.Folder, "report-verdict-files");

        var (exit, _, _) = CliRun.Run("report", "--db", fleet.Database, "--out", folder, "--device-pages", "none");

        Assert.Equal(0, exit);
        Assert.Equal(CliRun.Run("check", "--csv", "--db", fleet.Database).Out, File.ReadAllText(Path.Combine(folder, "verdicts.csv")));
        Assert.Equal(CliRun.Run("check", "--json", "--db", fleet.Database).Out, File.ReadAllText(Path.Combine(folder, "verdicts.json")));
    }

    [Theory]
    // ARW-DB1-Q07, path 1-E on 2021-03-05: 6518 MOhm read at 20.5 °C. Halving per 10 K (common practice): x 2^0.05 =
    // 1.0353, 6748 MOhm at 20 °C. The solid-insulation columns (tenfold per 50 K, from memory): x 10^0.01 = 1.0233,
    // 6670 MOhm. Three significant figures on the page.
    [InlineData("halving-10k", "6750 MΩ", "halves for every 10 K rise")]
    [InlineData("solid-insulation", "6670 MΩ", "tenfold for every 50 K rise")]
    public void TheInsulationTable_ShowsTheReadingAsMeasured_ItsTemperature_AndTheValueByTheNamedRule(string rule, string at20, string words)
    {
        var folder = Path.Combine(fleet.Folder, "report-" + rule);
        Directory.CreateDirectory(folder);
        var policy = Path.Combine(folder, "policy.conf");
        File.WriteAllText(policy, $"insulation_correction = {rule}\n");

        Assert.Equal(0, CliRun.Run("report", "--db", fleet.Database, "--out", folder, "--policy", policy).Exit);

        var page = File.ReadAllText(Path.Combine(folder, "devices", "ARW-DB1-Q07.html"));
        var row = page[page.IndexOf("<td>2021-03-05</td><td>as-found</td><td>1-E</td>", StringComparison.Ordinal)..];
        row = row[..row.IndexOf("</tr>", StringComparison.Ordinal)];
        Assert.Contains("<td>6520 MΩ</td><td>20.5 &#176;C</td><td>" + at20 + "</td>", row, StringComparison.Ordinal);
        Assert.Contains($"insulation_correction = {rule}: {words}", page, StringComparison.Ordinal);

        // Its 2026 insulation tests were made with a lapsed tester: those rows say so, its 2021 rows do not.
        var table = page[page.IndexOf("<h2>Insulation resistance</h2>", StringComparison.Ordinal)..];
        table = table[..table.IndexOf("</table>", StringComparison.Ordinal)];
        Assert.Contains("instrument not traceable", table[table.IndexOf("<td>2026-", StringComparison.Ordinal)..], StringComparison.Ordinal);
        Assert.DoesNotContain("instrument not traceable", row, StringComparison.Ordinal);
    }

    [Fact]
    public void DevicePagesDrawnOnSeveralThreads_AreEachWholeAndNameTheirOwnDevice()
    {
        var folder = Path.Combine(fleet.Folder, "report-whole");

        Assert.Equal(0, CliRun.Run("report", "--db", fleet.Database, "--out", folder).Exit);

        var pages = Directory.GetFiles(Path.Combine(folder, "devices"), "*.html");
        Assert.Equal(58, pages.Length);
        Assert.All(pages, page =>
        {
            var html = File.ReadAllText(page);
            Assert.EndsWith("</html>", html.TrimEnd(), StringComparison.Ordinal);
            Assert.Contains(Path.GetFileNameWithoutExtension(page), html, StringComparison.Ordinal);
        });
    }

    [Fact]
    public void APageThatCannotBeWritten_StopsTheReportWithOnePlainSentence()
    {
        // A folder where one device's page should go: its page writer fails while the others carry on.
        var folder = Path.Combine(fleet.Folder, "report-blocked");
        Directory.CreateDirectory(Path.Combine(folder, "devices", "BPS-DB1-Q03.html"));

        var (exit, output, error) = CliRun.Run("report", "--db", fleet.Database, "--out", folder);

        Assert.Equal(2, exit);
        Assert.StartsWith("error: ", error);
        Assert.DoesNotContain("   at ", error + output);
        Assert.False(File.Exists(Path.Combine(folder, "index.html")));
    }

    [Fact]
    public void AReport_ShowsItsProgressOnATerminal_AndClearsItBeforeTheSummary()
    {
        var (exit, output, error) = CliRun.RunOnTerminal("report", "--db", fleet.Database, "--out", Path.Combine(fleet.Folder, "report-progress"));

        Assert.Equal(0, exit);
        Assert.Contains("reading the fleet for the peer groups", error);
        Assert.Contains("] 58/58 ", error);
        Assert.EndsWith("\r" + new string(' ', 100) + "\r", error);
        Assert.All(error.Split('\r'), line => Assert.True(line.Length <= 100));
        Assert.StartsWith("Wrote 58 device pages", output);

        // Redirected (a script or a log), nothing is drawn.
        Assert.Equal("", CliRun.Run("report", "--db", fleet.Database, "--out", Path.Combine(fleet.Folder, "report-quiet")).Error);
    }

    [Fact]
    public async Task AReportThatStopsPartWay_LeavesTheEarlierCompleteDataFiles_AndNoPartialOnes()
    {
        var folder = Path.Combine(fleet.Folder, "report-stopped");
        Assert.Equal(0, CliRun.Run("report", "--db", fleet.Database, "--out", folder).Exit);
        string[] data = ["findings.csv", "findings.json", "verdicts.csv", "verdicts.json", "index.html"];
        var before = data.ToDictionary(name => name, name => File.ReadAllText(Path.Combine(folder, name)));

        // The second run fails on its fourth device as a full disk would fail a write.
        using var store = TripTestLog.Storage.Sqlite.RecordStore.Open(fleet.Database);
        var context = new TripTestLog.Reports.ReportContext(fleet.Database, "test", new DateOnly(2026, 12, 1), CliRun.Now,
            TripTestLog.Application.Findings.FindingPolicy.Default, "default", store.Instruments());
        var written = 0;
        var failure = await Record.ExceptionAsync(() => Services.ReportRun.WriteAsync(store, folder, context, TripTestLog.Application.Reports.ReportSelection.All,
            CancellationToken.None, _ =>
            {
                if (++written == 4)
                {
                    throw new IOException("No space left on device");
                }
            }));

        Assert.IsType<IOException>(failure);
        foreach (var name in data)
        {
            Assert.Equal(before[name], File.ReadAllText(Path.Combine(folder, name)));
        }

        Assert.Empty(Directory.GetFiles(folder, "*.partial", SearchOption.AllDirectories));
    }

    [Fact]
    public void AReportForOneSite_WritesOnlyItsDevices()
    {
        var folder = Path.Combine(fleet.Folder, "report-site");

        var (exit, _, _) = CliRun.Run("report", "--db", fleet.Database, "--out", folder, "--site", "Copperwell Depot");

        Assert.Equal(0, exit);
        Assert.All(Directory.GetFiles(Path.Combine(folder, "devices")), f => Assert.StartsWith("CWD-", Path.GetFileName(f)));
        Assert.Equal(11, Directory.GetFiles(Path.Combine(folder, "devices")).Length); // ten C16s and one never tested
    }

    [Theory]
    [InlineData("--device-pages", "some", "error: --device-pages: expected all or none, got 'some'")]
    [InlineData("--from", "2026-02-30", "error: --from: expected a date as YYYY-MM-DD")]
    public void AMistake_GetsOnePlainSentence(string option, string value, string expected)
    {
        var (exit, output, error) = CliRun.Run("report", "--db", fleet.Database, option, value);

        Assert.Equal(2, exit);
        Assert.StartsWith(expected, error);
        Assert.DoesNotContain("   at ", error + output);
    }

    [Fact]
    public void AnOutFolderThatIsAFile_IsRefusedPlainly()
    {
        var file = Path.Combine(fleet.Folder, "not-a-folder.txt");
        File.WriteAllText(file, "x");

        var (exit, output, error) = CliRun.Run("report", "--db", fleet.Database, "--out", Path.Combine(file, "report"));

        Assert.Equal(2, exit);
        Assert.StartsWith("error: --out: cannot write the report to", error);
        Assert.DoesNotContain("   at ", error + output);
    }
}
