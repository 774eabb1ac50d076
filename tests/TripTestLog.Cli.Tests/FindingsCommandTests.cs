using System.Text.Json;

namespace TripTestLog.Cli.Tests;

/// <summary>`findings`, `fleet` and `policy` on the sample fleet's real database.</summary>
public sealed class FindingsCommandTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    // Which invented device shows which finding: docs/findings.md says the same, and a test below holds them together.
    public static readonly TheoryData<string, string> KindsAndDevices = new()
    {
        { "trip-out-of-band", "BPS-DB1-Q03" },
        { "retest-needed", "ARW-MCC-Q01" },
        { "trip-drift", "ARW-DB1-Q05" },
        { "trip-trend-exit", "ARW-DB1-Q05" },
        { "peer-outlier", "CWD-DB1-Q04" },
        { "contact-over-limit", "ARW-DB2-Q02" },
        { "contact-pole-spread", "ARW-DB2-Q02" },
        { "contact-rise", "ARW-DB2-Q02" },
        { "contact-trend-limit", "CWD-DB1-Q06" },
        { "contact-low-test-current", "ARW-DB2-Q09" },
        { "insulation-below-minimum", "CWD-DB1-Q07" },
        { "insulation-falling", "CWD-DB1-Q08" },
        { "calibration-lapsed", "CWD-DB1-Q01" },
        { "instrument-unregistered", "CWD-DB1-Q10" },
        { "settings-differ", "ARW-MSB-Q01" },
        { "test-overdue", "CWD-DB1-Q09" },
        { "insulation-test-voltage", "ARW-DB1-Q06" },
    };

    private (int Exit, string Out, string Error) Run(params string[] args) => CliRun.Run([.. args, "--db", fleet.Database]);

    [Theory]
    [MemberData(nameof(KindsAndDevices))]
    public void TheSampleFleet_ShowsEveryKind_OnTheDeviceTheReadmeNames(string kind, string asset)
    {
        var (exit, output, _) = Run("findings", "--json", "--kind", kind);
        var findings = JsonDocument.Parse(output).RootElement.EnumerateArray().ToList();

        Assert.Equal(0, exit);
        Assert.Contains(findings, f => f.GetProperty("asset_tag").GetString() == asset);
        Assert.All(findings, f => Assert.Equal(kind, f.GetProperty("kind").GetString()));
        var readme = File.ReadLines(Path.Combine(Golden.RepositoryRoot(), "docs", "findings.md"));
        Assert.Contains(readme, line => line.Contains($"`{kind}`", StringComparison.Ordinal) && line.Contains(asset, StringComparison.Ordinal));
    }

    [Fact]
    public void ANotAssessableTest_StaysOpenAsARetest_AndKeepsItsDeviceOutOfSound()
    {
        // ARW-MCC-Q01 (thermal-magnetic, no curve table): cold trips at about 3 Ir meet only the 1.30 Ir limit carried
        // upward (IEC 60947-2 8.3.3, from memory), so they prove nothing and the device cannot be graded sound.
        var (_, findings, _) = Run("findings", "--json", "--asset", "ARW-MCC-Q01");
        var (_, fleet, _) = Run("fleet", "--json", "--asset", "ARW-MCC-Q01");

        var retest = JsonDocument.Parse(findings).RootElement.EnumerateArray().Single(f => f.GetProperty("kind").GetString() == "retest-needed");
        Assert.Equal("open", retest.GetProperty("status").GetString());
        Assert.Contains("1.30Ir", retest.GetProperty("message").GetString());
        var listed = JsonDocument.Parse(fleet).RootElement.GetProperty("priority").EnumerateArray().Single();
        Assert.Equal("watch", listed.GetProperty("grade").GetString());
        Assert.Contains("retest-needed", listed.GetProperty("why").GetString());
    }

    [Fact]
    public void AsLeftCleaning_KeepsTheOverLimitPoleInTheHistory_AtTheSeverityOfACheck()
    {
        // ARW-DB2-Q02 pole 1 rose 20 % a year over its 6750 uOhm limit; in 2026 it was cleaned and measured again as-left.
        var (_, output, _) = Run("findings", "--json", "--asset", "ARW-DB2-Q02");
        var over = JsonDocument.Parse(output).RootElement.EnumerateArray().Single(f => f.GetProperty("kind").GetString() == "contact-over-limit");

        Assert.Equal(("open", "investigate", "1"), (over.GetProperty("status").GetString(), over.GetProperty("severity").GetString(), over.GetProperty("pole").GetString()));
        Assert.Contains("as-left", over.GetProperty("standing").GetString());
        Assert.Equal(6750, over.GetProperty("limit_uohm").GetDouble());
        Assert.True(over.GetProperty("value_uohm").GetDouble() > 6750);
        Assert.True(string.CompareOrdinal(over.GetProperty("first_seen").GetString(), "2024") < 0);
    }

    [Fact]
    public void FindingsJson_HasTheDocumentedFieldsInTheirOrder()
    {
        var (_, output, _) = Run("findings", "--json", "--asset", "CWD-DB1-Q06");
        var first = JsonDocument.Parse(output).RootElement.EnumerateArray().First();

        Golden.Matches("findings-json-fields.txt", string.Join("\n", first.EnumerateObject().Select(p => p.Name)) + "\n");
        var csv = Run("findings", "--csv", "--asset", "CWD-DB1-Q06").Out;
        Assert.Equal(string.Join(",", first.EnumerateObject().Select(p => p.Name)), csv.Split('\n')[0]);
    }

    [Theory]
    // The sample fleet: BPS-DB1-Q08's 2025 trip tests used Brackenford's injection set after its calibration ran out
    // (2025-08-31); CWD-DB1-Q06's 2026 contact readings the depot's ohmmeter before its late recalibration.
    [InlineData("BPS-DB1-Q08", "trip-trend-exit")]
    [InlineData("CWD-DB1-Q06", "contact-trend-limit")]
    public void ATrendWithAnUntraceableReading_SaysSo_AndCountsIt(string asset, string kind)
    {
        var (_, output, _) = Run("findings", "--json", "--asset", asset);

        var trend = JsonDocument.Parse(output).RootElement.EnumerateArray().Single(f => f.GetProperty("kind").GetString() == kind);
        Assert.Equal(1, trend.GetProperty("untraceable_readings").GetDouble());
        Assert.Contains("comes from an instrument not traceable on the day (marked on the chart; untraceable_readings = mark)",
            trend.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void FindingsText_ForOneDevice_MatchesTheGoldenFile()
    {
        var (exit, output, _) = Run("findings", "--asset", "ARW-DB2-Q02", "--include-closed");

        Assert.Equal(0, exit);
        Assert.All(output.Split('\n'), line => Assert.True(line.Length <= 100, $"wider than 100 columns: {line}"));
        Golden.Matches("findings-arw-db2-q02.txt", fleet.Portable(output));
    }

    [Fact]
    public void Fleet_MatchesTheGoldenFile_AndFitsA100ColumnTerminal()
    {
        var (exit, output, _) = Run("fleet");

        Assert.Equal(0, exit);
        Assert.All(output.Split('\n'), line => Assert.True(line.Length <= 100, $"wider than 100 columns: {line}"));
        Golden.Matches("fleet.txt", fleet.Portable(output));
    }

    [Fact]
    public void FleetJson_ListsThePriorityWorstFirst()
    {
        var root = JsonDocument.Parse(Run("fleet", "--json", "--top", "3").Out).RootElement;
        var priority = root.GetProperty("priority").EnumerateArray().ToList();

        Assert.Equal(3, priority.Count);
        Assert.Equal(("BPS-DB1-Q03", "take-out-of-service"), (priority[0].GetProperty("asset_tag").GetString(), priority[0].GetProperty("grade").GetString()));
        Assert.Equal(58, root.GetProperty("sites").EnumerateArray().Sum(s => s.GetProperty("devices").GetInt32()));
    }

    [Fact]
    public void FleetJson_HasTheDocumentedPriorityAndModelFields()
    {
        var root = JsonDocument.Parse(Run("fleet", "--json").Out).RootElement;
        var names = root.EnumerateObject().Select(p => p.Name)
            .Concat(root.GetProperty("priority").EnumerateArray().First().EnumerateObject().Select(p => "priority." + p.Name))
            .Concat(root.GetProperty("models").EnumerateObject().Select(p => "models." + p.Name))
            .Concat(root.GetProperty("models").GetProperty("groups").EnumerateArray().First().EnumerateObject().Select(p => "models.groups." + p.Name));

        Golden.Matches("fleet-json-fields.txt", string.Join("\n", names) + "\n");
    }

    [Fact]
    public void TheSampleFleet_HasADeviceNeverTested_GradedUntested()
    {
        var (_, output, _) = Run("findings", "--json", "--asset", "CWD-DB1-Q11");
        var overdue = Assert.Single(JsonDocument.Parse(output).RootElement.EnumerateArray());

        Assert.Equal(("untested", "2025-06-02"), (overdue.GetProperty("grade").GetString(), overdue.GetProperty("due_on").GetString()));
        Assert.StartsWith("never tested; due since 2025-06-02", overdue.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void OneLapsedInstrument_GivesOneLineNamingItsDevices()
    {
        // Copperwell's ohmmeter OHM-CWD-1 was out of calibration for the depot's 2026 contact tests: the devices whose
        // worst finding that is share one line of the priority list.
        var (_, output, _) = Run("fleet", "--top", "60");
        var priority = output[..output.IndexOf("Which models fail", StringComparison.Ordinal)];
        var text = System.Text.RegularExpressions.Regex.Replace(priority, @"\s+", " ");

        Assert.Single(System.Text.RegularExpressions.Regex.Matches(text, @"one cause \(instrument OHM-CWD-1\)"));
        Assert.Matches(@"one cause \(instrument OHM-CWD-1\) on 5 devices: CWD-DB1-Q0\d(, CWD-DB1-Q0\d){4}", text);
        Assert.DoesNotContain(" +1", text, StringComparison.Ordinal);
        Assert.DoesNotContain(" +2", text, StringComparison.Ordinal);
    }

    [Fact]
    public void FleetCsv_GivesNoFigureBelowThePolicyMinimum()
    {
        var (exit, output, _) = Run("fleet", "--csv");
        var rows = output.Trim().Split('\n').Skip(1).Select(r => r.Split(',')).ToList();

        Assert.Equal(0, exit);
        Assert.StartsWith("grouping,group,devices,tested,failed,failure_rate,wilson_low,wilson_high", output, StringComparison.Ordinal);
        Assert.All(rows.Where(r => int.Parse(r[3], System.Globalization.CultureInfo.InvariantCulture) < 5), r => Assert.Equal("", r[5]));
        Assert.Contains(rows, r => r[5].Length > 0);
    }

    [Fact]
    public void Filters_NarrowTheList()
    {
        List<JsonElement> Json(params string[] args) => [.. JsonDocument.Parse(Run(["findings", "--json", .. args]).Out).RootElement.EnumerateArray()];

        Assert.All(Json("--grade", "take-out-of-service"), f => Assert.Equal("BPS-DB1-Q03", f.GetProperty("asset_tag").GetString()));
        Assert.All(Json("--site", "Copperwell Depot"), f => Assert.StartsWith("CWD-", f.GetProperty("asset_tag").GetString()));
        var due = Json("--due-before", "2026-12-01");
        Assert.NotEmpty(due);
        Assert.All(due, f => Assert.True(string.CompareOrdinal(f.GetProperty("due_on").GetString(), "2026-12-01") < 0));
        Assert.True(Json().Count > Json("--kind", "trip-drift").Count);
    }

    [Fact]
    public void ThePolicyBesideTheDatabase_IsTheOneInForce()
    {
        var (exit, output, _) = Run("policy");

        Assert.Equal(0, exit);
        Assert.Contains("lab-policy.conf", output.Split('\n')[0]);
        Assert.Contains("require_registered_instruments = yes", output);
        Assert.Contains("peer_z_limit = 3.5", output);
    }

    [Theory]
    [InlineData("--as-of", "1 Dec 2026", "error: --as-of: expected a date as YYYY-MM-DD, got '1 Dec 2026'")]
    [InlineData("--kind", "trip-late", "error: --kind: 'trip-late' is not a finding kind")]
    [InlineData("--grade", "bad", "error: --grade: 'bad' is not a grade")]
    [InlineData("--due-before", "2026-13-01", "error: --due-before: expected a date")]
    [InlineData("--asset", "NO-SUCH", "error: --asset: 'NO-SUCH' is not in the device register")]
    [InlineData("--policy", "/no/such/policy.conf", "error: --policy: no policy file at /no/such/policy.conf")]
    public void AMistake_GetsOnePlainSentence_AndExit2(string option, string value, string expected)
    {
        var (exit, output, error) = Run("findings", option, value);

        Assert.Equal(2, exit);
        Assert.StartsWith(expected, error);
        Assert.Single(CliRun.Unwrapped(error).Split('\n'));
        Assert.DoesNotContain("   at ", error + output);
    }

    [Fact]
    public void ABadPolicyFile_IsRefusedWithItsLine()
    {
        var policy = Path.Combine(fleet.Folder, "bad-policy.conf");
        File.WriteAllText(policy, "peer_z_limit = 3.5\ncontact_rise = 20\n");

        var (exit, _, error) = Run("fleet", "--policy", policy);

        Assert.Equal(2, exit);
        Assert.StartsWith("error: bad-policy.conf line 2: unknown key contact_rise", error);
    }
}
