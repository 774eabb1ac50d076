namespace TripTestLog.Cli.Tests;

/// <summary>
/// A control character in a value (an escape sequence that clears a terminal and retitles its window) is shown as its
/// code in everything printed for a person, and kept exactly in CSV and JSON. Common practice, no source.
/// </summary>
public sealed class TerminalSafetyTests : IDisposable
{
    private const string Attack = "4\u001b[2J\u001b[H\u001b]0;owned\u0007";
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-term-" + Guid.NewGuid().ToString("N")[..12]);

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void ControlCharacters_InValues_AreShownAsCodes_ByEveryHumanCommand_AndKeptExactInCsvAndJson()
    {
        Directory.CreateDirectory(_folder);
        var db = Path.Combine(_folder, "t.db");
        var register = Path.Combine(_folder, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\n"
            + $"X-01,\"Site {Attack}\",\"Board {Attack}\",iec60898,C,16,1,230\n");
        var trips = Path.Combine(_folder, "trips.csv");
        File.WriteAllText(trips, "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note\n"
            + $"X-01,2026-03-18T12:00,as-found,all,40.9,75,,cold,30,INJ-1,\"T {Attack}\",\"note {Attack}\"\n");
        var bad = Path.Combine(_folder, "bad.csv");
        File.WriteAllText(bad, "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n"
            + $"X-01,2026-03-18T13:00,as-found,all,\"{Attack}\",75,,cold\n");
        Assert.Equal(0, CliRun.Run("import", register, trips, "--db", db).Exit);

        var runs = new[]
        {
            CliRun.Run("import", bad, "--db", db),
            CliRun.Run("devices", "--db", db),
            CliRun.Run("history", "--db", db, "--asset", "X-01"),
            CliRun.Run("fleet", "--db", db),
            CliRun.Run("check", "--db", db),
            CliRun.Run("findings", "--db", db),
        };
        var csv = CliRun.Run("findings", "--db", db, "--csv").Out;
        var json = CliRun.Run("devices", "--db", db, "--json").Out;

        Assert.Contains("4\\x1b[2J\\x1b[H\\x1b]0;owned\\x07", runs[0].Out);
        Assert.Contains("Site 4\\x1b[2J", runs[1].Out + runs[2].Out);
        Assert.Contains("\\x1b[H\\x1b]0;owned\\x07", runs[3].Out); // the site column shortens a long name from the front
        foreach (var (exit, output, error) in runs)
        {
            Assert.DoesNotContain('\u001b', output + error);
            Assert.DoesNotContain('\u0007', output + error);
            Assert.All((output + error).Split('\n'), line => Assert.True(line.Length <= 100, line));
        }

        Assert.Contains(Attack, csv);
        Assert.Contains("\\u001B[2J", json);
    }
}
