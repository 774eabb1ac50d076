using System.Text.Json;
using TripTestLog.Cli.Output;

namespace TripTestLog.Cli.Tests;

/// <summary>`worksheet` on the sample fleet: the page and the CSVs, and the round trip through import and check.</summary>
public sealed class WorksheetCommandTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    [Fact]
    public void AWorksheet_FilledInPart_Imports_TheBlankRowsCountAsNotTested_AndTheFilledOnesAreJudged()
    {
        var work = Path.Combine(fleet.Folder, "worksheet-round-trip");
        var db = CopyOfTheFleet(work);
        var sheet = Path.Combine(work, "sheet");
        Assert.Equal(0, CliRun.Run("worksheet", "--db", db, "--asset", "ARW-DB1-Q05", "--out", sheet).Exit);
        var before = Count(db, "ARW-DB1-Q05");

        // ARW-DB1-Q05 is a three-pole C25 (IEC 60898-1 Table 7, In <= 32 A): row a held for the hour passes; row c at
        // 63.75 A tripping at 0.5 s is below its "1 s < t" and too early; the other trip rows stay blank.
        var trips = Path.Combine(sheet, WorksheetCsv.TripFile);
        var lines = File.ReadAllLines(trips);
        Assert.Equal("ARW-DB1-Q05,,as-found,all,28.25,,,cold,,,,,T1", lines[1]);
        Assert.Equal("ARW-DB1-Q05,,as-found,all,63.75,,,cold,,,,,T4", lines[4]);
        // In a test room at 29 °C, within 5 K of the 30 °C reference, so the hold proves row a.
        lines[1] = "ARW-DB1-Q05,2026-11-30T08:00,as-found,all,28.25,,3600,cold,29,INJ-ARW-1,E. Marlow,,T1";
        lines[4] = "ARW-DB1-Q05,2026-11-30T10:00,as-found,all,63.75,0.5,,cold,29,INJ-ARW-1,E. Marlow,,T4";
        File.WriteAllLines(trips, lines);
        var contacts = Path.Combine(sheet, WorksheetCsv.ContactFile);
        var contactLines = File.ReadAllLines(contacts);
        contactLines[2] = contactLines[2].Replace(",,as-found,2,,10,,,,C2", ",2026-11-30,as-found,2,4100,10,21,OHM-ARW-1,E. Marlow,C2", StringComparison.Ordinal);
        File.WriteAllLines(contacts, contactLines);

        var (exit, output, error) = CliRun.Run("import", sheet, "--db", db);

        Assert.True(exit == 0, error + output);
        Assert.Contains("Not tested", output);
        Assert.True(output.Contains("trip tests  imported     6      2           0           4        0", StringComparison.Ordinal), output);
        Assert.Contains("14 planned rows were left blank on a worksheet: counted as not tested, not stored.", output);
        Assert.Equal(before + 2, Count(db, "ARW-DB1-Q05"));

        var verdicts = JsonDocument.Parse(CliRun.Run("check", "--json", "--asset", "ARW-DB1-Q05", "--from", "2026-11-30", "--db", db).Out).RootElement
            .EnumerateArray().ToList();
        Assert.Equal(2, verdicts.Count);
        Assert.Equal("pass", verdicts.Single(v => v.GetProperty("current_a").GetDouble() == 28.25).GetProperty("verdict").GetString());
        Assert.Equal("too-early", verdicts.Single(v => v.GetProperty("current_a").GetDouble() == 63.75).GetProperty("verdict").GetString());
        Assert.Equal("a", verdicts.Single(v => v.GetProperty("current_a").GetDouble() == 28.25).GetProperty("normative_point").GetString());
    }

    [Fact]
    public void RunningTheWorksheetAgain_OverABlankSheet_RewritesIt_ButOverOneHoldingResults_RefusesAndNamesTheFile()
    {
        var folder = Path.Combine(fleet.Folder, "worksheet-again");
        Assert.Equal(0, CliRun.Run("worksheet", "--db", fleet.Database, "--asset", "ARW-DB1-Q05", "--out", folder).Exit);
        Assert.Equal(0, CliRun.Run("worksheet", "--db", fleet.Database, "--asset", "ARW-DB1-Q05", "--out", folder).Exit);

        var trips = Path.Combine(folder, WorksheetCsv.TripFile);
        var lines = File.ReadAllLines(trips);
        var cells = lines[2].Split(',');
        cells[1] = "2026-12-01T09:40";
        cells[5] = "12.5";
        lines[2] = string.Join(',', cells);
        File.WriteAllLines(trips, lines);

        var (exit, output, error) = CliRun.Run("worksheet", "--db", fleet.Database, "--asset", "ARW-DB1-Q05", "--out", folder);

        Assert.Equal(2, exit);
        Assert.Equal("", output);
        var sentence = string.Join(' ', error.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
        Assert.StartsWith("error: ", sentence, StringComparison.Ordinal);
        Assert.Contains(WorksheetCsv.TripFile + " already holds results (line 3)", sentence, StringComparison.Ordinal);
        Assert.All(error.Split('\n'), l => Assert.True(l.Length <= 100, l));
        Assert.Equal(lines, File.ReadAllLines(trips));
    }

    [Fact]
    public void TheSheet_ListsEachPointWithItsWindow_AndCarriesTheCaution()
    {
        var folder = Path.Combine(fleet.Folder, "worksheet-page");

        var (exit, output, _) = CliRun.Run("worksheet", "--db", fleet.Database, "--site", "Alder Ridge Works", "--out", folder);

        Assert.Equal(0, exit);
        Golden.Matches("worksheet-alder-ridge.txt", fleet.Portable(output).Replace(folder, "<out>", StringComparison.Ordinal));
        var html = File.ReadAllText(Path.Combine(folder, "worksheet.html"));
        Assert.Contains("Caution:", html);
        Assert.Contains("<h2>ARW-DB1-Q05</h2>", html);
        Assert.Contains("warm: straight after T1, no cooling", html);
        Assert.Contains("trip after 1 s and before 60 s", html);
        Assert.Contains("no trip within 1 h", html);
        Assert.Contains("IEC 60898-1 Table 7 c", html);
        Assert.Contains("class=\"entry\"", html);

        // The three CSVs for one three-pole breaker: golden, so a change of format shows in review.
        var q05 = string.Join('\n', new[] { WorksheetCsv.TripFile, WorksheetCsv.ContactFile, WorksheetCsv.InsulationFile }
            .SelectMany(f => File.ReadLines(Path.Combine(folder, f)).Take(1).Concat(File.ReadLines(Path.Combine(folder, f)).Where(l => l.StartsWith("ARW-DB1-Q05,", StringComparison.Ordinal)))));
        Golden.Matches("worksheet-arw-db1-q05-csv.txt", q05 + "\n");
    }

    [Theory]
    [InlineData(new[] { "worksheet" }, "error: give --asset TAG or --site SITE")]
    [InlineData(new[] { "worksheet", "--asset", "NOPE-1" }, "error: --asset: 'NOPE-1' is not in the device register")]
    [InlineData(new[] { "worksheet", "--site", "Nowhere" }, "error: --site: no device in the register is at 'Nowhere'")]
    [InlineData(new[] { "worksheet", "--asset", "ARW-DB1-Q05", "--stage", "as-was" }, "error: --stage: 'as-was' is not a stage")]
    public void AMistake_GetsOnePlainSentence(string[] args, string expected)
    {
        var (exit, output, error) = CliRun.Run([.. args, "--db", fleet.Database]);

        Assert.Equal(2, exit);
        Assert.StartsWith(expected, error);
        Assert.DoesNotContain("   at ", error + output);
    }

    [Theory]
    [InlineData(1.13 * 6, "6.78")]
    [InlineData(1.45 * 25, "36.25")]
    [InlineData(1.0 / 3.0, "0.3333333333333333")]
    public void APlannedCurrent_IsWrittenShort_WhenThatReadsBackOnTheSamePoint(double value, string expected) =>
        Assert.Equal(expected, WorksheetCsv.Exact(value));

    private static string CopyOfTheFleet(string folder)
    {
        Directory.CreateDirectory(folder);
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        var db = Path.Combine(folder, "triptestlog.db");
        Assert.Equal(0, CliRun.Run("backup", Path.Combine(folder, "copy.db"), "--db", Path.Combine(Path.GetDirectoryName(folder)!, "triptestlog.db")).Exit);
        File.Move(Path.Combine(folder, "copy.db"), db);
        return db;
    }

    private static int Count(string db, string tag) =>
        JsonDocument.Parse(CliRun.Run("check", "--json", "--asset", tag, "--db", db).Out).RootElement.GetArrayLength();
}
