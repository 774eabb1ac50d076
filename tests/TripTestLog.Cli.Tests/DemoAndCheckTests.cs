using System.Text.Json;
using TripTestLog.SampleGenerator;

namespace TripTestLog.Cli.Tests;

/// <summary>The main job end to end on the committed sample records: a real database, real files, real output.</summary>
public sealed class DemoAndCheckTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-cli-" + Guid.NewGuid().ToString("N")[..12]);

    private static string SampleRecords => Path.Combine(Golden.RepositoryRoot(), "sample-records");

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        if (Directory.Exists(_folder))
        {
            Directory.Delete(_folder, recursive: true);
        }
    }

    [Fact]
    public void TheSampleRecords_TravelBesideTheProgram_FileForFile()
    {
        // The demo finds them beside the program when no sample-records folder is here or above: the packed tool carries
        // these files (CI installs the tool and runs its demo in an empty folder).
        var shipped = Path.Combine(AppContext.BaseDirectory, "sample-records");
        var files = Directory.GetFiles(SampleRecords, "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(SampleRecords, f)).Order().ToList();

        Assert.NotEmpty(files);
        Assert.Equal(files, Directory.GetFiles(shipped, "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(shipped, f)).Order().ToList());
        Assert.All(files, f => Assert.Equal(File.ReadAllBytes(Path.Combine(SampleRecords, f)), File.ReadAllBytes(Path.Combine(shipped, f))));
    }

    [Fact]
    public void Demo_ImportsEverySampleFile_AndFindsTheFleetsStory()
    {
        var (exit, output, _) = CliRun.Run("demo", "--records", SampleRecords, "--out", _folder);

        Assert.Equal(0, exit);
        Assert.Contains("72 files: 72 imported, 0 already imported, 0 refused", output);
        var verdicts = JsonDocument.Parse(File.ReadAllText(Path.Combine(_folder, "verdicts.json"))).RootElement.EnumerateArray().ToList();
        var findings = verdicts.Where(v => v.GetProperty("verdict").GetString() is "too-late" or "too-early").ToList();

        // The generator gives one device a 1.45 In hold for the full hour in its last year (IEC 60898-1 Table 7 b).
        var late = Assert.Single(findings);
        Assert.Equal(("BPS-DB1-Q03", "b", "normative"), (late.GetProperty("asset_tag").GetString(), late.GetProperty("normative_point").GetString(), late.GetProperty("basis").GetString()));
        Assert.Contains(verdicts, v => v.GetProperty("basis").GetString() == "band");
        Assert.Contains(verdicts, v => v.GetProperty("verdict").GetString() == "not-assessable");
        Assert.Contains("Caution:", File.ReadAllText(Path.Combine(_folder, "verdicts.txt")));

        // Every family is judged, and the settings history matters: the electronic unit's 2021 tests (Ir 400 A) and
        // 2023 tests (Ir 500 A) both pass only because each is judged with the settings of its date.
        var families = verdicts.Select(v => v.GetProperty("family").GetString()).ToHashSet();
        Assert.Equal(["curve-table", "iec60898", "iec60947-electronic", "iec60947-thermal-magnetic", "relay-idmt"], families.Order());
        var unit = verdicts.Where(v => v.GetProperty("asset_tag").GetString() == "ARW-MSB-Q01").ToList();
        Assert.All(unit, v => Assert.Equal("pass", v.GetProperty("verdict").GetString()));
        Assert.Contains(unit, v => v.GetProperty("reference_a").GetDouble() == 400);
        Assert.Contains(unit, v => v.GetProperty("reference_a").GetDouble() == 500);
        Assert.Contains(unit, v => v.GetProperty("notes").EnumerateArray().Any(n => n.GetString()!.Contains("Ir 420 A found", StringComparison.Ordinal)));
        Assert.Contains(verdicts, v => v.GetProperty("notes").EnumerateArray().Any(n => n.GetString()!.Contains("ambient table HB-TM-AMBIENT", StringComparison.Ordinal)));

        // The instrument register: Brackenford's injection set lapsed before its September 2025 tests, and (the sample
        // labs' policy requiring registered instruments) Copperwell's borrowed set was never registered.
        var untraceable = verdicts.Where(v => v.GetProperty("instrument_finding").GetString() is not null).ToList();
        Assert.NotEmpty(untraceable);
        Assert.All(untraceable, v => Assert.True(v.GetProperty("tested_at").GetString()!.StartsWith("2025-09", StringComparison.Ordinal)
            || v.GetProperty("asset_tag").GetString() == "CWD-DB1-Q10", v.ToString()));
        Assert.Contains(untraceable, v => v.GetProperty("instrument_finding").GetString()!.Contains("INJ-CWD-LOAN is not in the instrument register", StringComparison.Ordinal));

        // The two other layouts came in through their profiles.
        Assert.Contains(verdicts, v => v.GetProperty("source_file").GetString()!.EndsWith("bench-2026-11.csv", StringComparison.Ordinal));
    }

    [Fact]
    public void ImportAcceptValid_StoresTheGoodRows_WritesTheRejects_AndExitsWith1()
    {
        Directory.CreateDirectory(_folder);
        var db = Path.Combine(_folder, "t.db");
        var file = Path.Combine(_folder, "mixed.csv");
        File.WriteAllText(file, "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\nARW-DB1-Q01,2024-03-18,as-found,all,6.8,,3600,cold\nARW-DB1-Q01,2024-03-19,as-found,all,x,,3600,cold\n");
        CliRun.Run("import", Path.Combine(SampleRecords, "device-register.csv"), "--db", db);

        var (exit, output, _) = CliRun.Run("import", file, "--db", db, "--accept-valid");

        Assert.Equal(1, exit);
        Assert.Contains("1 row refused, the rest stored", output);
        var rejects = Path.Combine(_folder, "mixed.rejects.csv");
        Assert.Contains(rejects, output);
        Assert.Contains("'x' is not a number", File.ReadAllText(rejects));
    }

    [Fact]
    public void VerifyAndBackup_WorkOnALiveDatabase()
    {
        Directory.CreateDirectory(_folder);
        var db = Path.Combine(_folder, "t.db");
        var register = Path.Combine(_folder, "register.csv");
        File.Copy(Path.Combine(SampleRecords, "device-register.csv"), register);
        CliRun.Run("import", register, "--db", db);

        var sound = CliRun.Run("verify", "--db", db);
        File.AppendAllText(register, "\n");
        var changed = CliRun.Run("verify", "--db", db);
        var backup = CliRun.Run("backup", Path.Combine(_folder, "copy.db"), "--db", db);

        Assert.Equal((0, 1, 0), (sound.Exit, changed.Exit, backup.Exit));
        Assert.Contains("The database is sound.", sound.Out);
        Assert.Contains("CHANGED since import", changed.Out);
        Assert.Contains("58 devices", backup.Out);
        Assert.Equal(2, CliRun.Run("backup", Path.Combine(_folder, "copy.db"), "--db", db).Exit);
    }

    [Fact]
    public void CheckJson_HasTheDocumentedFieldsInTheirOrder()
    {
        CliRun.Run("demo", "--records", SampleRecords, "--out", _folder);

        var (exit, output, _) = CliRun.Run("check", "--db", Path.Combine(_folder, "triptestlog.db"), "--asset", "ARW-DB1-Q03", "--json");

        Assert.Equal(0, exit);
        var rows = JsonDocument.Parse(output).RootElement.EnumerateArray().ToList();
        Assert.All(rows, r => Assert.Equal("ARW-DB1-Q03", r.GetProperty("asset_tag").GetString()));
        Golden.Matches("check-json-fields.txt", string.Join('\n', rows[0].EnumerateObject().Select(p => p.Name)) + "\n");
    }

    [Fact]
    public void Envelope_OfARegisteredDevice_UsesItsNewestSettings()
    {
        CliRun.Run("demo", "--records", SampleRecords, "--out", _folder);

        var (exit, output, error) = CliRun.Run("envelope", "--asset", "ARW-MSB-F01", "--db", Path.Combine(_folder, "triptestlog.db"));

        Assert.True(exit == 0, error);
        // The title wraps to the terminal; read it as one line.
        Assert.Contains("standard-inverse, pickup 800 A, TMS 0.2, high-set 8000 A after 50 ms", string.Join(' ', output.Split('\n').Select(l => l.Trim())));
        Assert.Contains("characteristic", output);
    }

    [Fact]
    public void CheckWithFailOnFindings_ExitsWith1WhenATestIsOutsideTheBand()
    {
        CliRun.Run("demo", "--records", SampleRecords, "--out", _folder);
        var db = Path.Combine(_folder, "triptestlog.db");

        Assert.Equal(1, CliRun.Run("check", "--db", db, "--fail-on-findings").Exit);
        Assert.Equal(0, CliRun.Run("check", "--db", db, "--asset", "ARW-DB1-Q01", "--fail-on-findings").Exit);
    }

    [Fact]
    public void Import_OfABadFile_ExitsWith2_NamesTheLine_AndStoresNothingFromIt()
    {
        Directory.CreateDirectory(_folder);
        var db = Path.Combine(_folder, "t.db");
        var bad = Path.Combine(_folder, "bad.csv");
        File.WriteAllText(bad, "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\nARW-DB1-Q01,2024-03-18,as-found,all,6.8,,3600,cold\nARW-DB1-Q01,2024-03-18,as-found,all,x,,3600,cold\n");
        CliRun.Run("import", Path.Combine(SampleRecords, "device-register.csv"), "--db", db);

        var (exit, output, _) = CliRun.Run("import", bad, "--db", db);

        Assert.Equal(2, exit);
        Assert.Contains($"{bad}:3, column current_a: 'x' is not a number", output);
        Assert.Contains("nothing from it was stored", output);
        Assert.Contains("0 trip tests", CliRun.Run("check", "--db", db).Out);
    }

    [Fact]
    public void Check_ForAnAssetNotInTheRegister_SaysSo()
    {
        CliRun.Run("demo", "--records", SampleRecords, "--out", _folder);

        var (exit, _, error) = CliRun.Run("check", "--db", Path.Combine(_folder, "triptestlog.db"), "--asset", "NO-SUCH-TAG");

        Assert.Equal(2, exit);
        Assert.Contains("'NO-SUCH-TAG' is not in the device register", error);
    }

    [Fact]
    public void Check_WithoutADatabase_SaysToImportFirst()
    {
        var (exit, _, error) = CliRun.Run("check", "--db", Path.Combine(_folder, "none.db"));

        Assert.Equal(2, exit);
        Assert.Contains("import records first", error);
    }

    [Fact]
    public void TheGenerator_ReproducesTheCommittedSampleRecordsByteForByte()
    {
        var written = SampleFleet.WriteTo(_folder);

        Assert.Equal(75, written.Count);
        foreach (var file in written)
        {
            var committed = Path.Combine(SampleRecords, Path.GetRelativePath(_folder, file));
            Assert.True(File.Exists(committed), $"{committed} is not committed");
            Assert.Equal(File.ReadAllBytes(committed), File.ReadAllBytes(file));
        }
    }
}
