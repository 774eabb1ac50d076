namespace TripTestLog.Cli.Tests;

/// <summary>`findings --csv` neutralises cells a spreadsheet would run as a formula (OWASP, "CSV Injection").</summary>
public sealed class FindingsCsvTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-csv-" + Guid.NewGuid().ToString("N")[..12]);

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void ASiteNamedLikeAFormula_IsWrittenAsText()
    {
        Directory.CreateDirectory(_folder);
        var db = Path.Combine(_folder, "t.db");
        var register = Path.Combine(_folder, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial\n"
            + "X-01,\"=HYPERLINK(\"\"http://example.invalid\"\")\",Way 1,iec60898,C,16,1,230,2019-01-01,,,,\n");
        var trips = Path.Combine(_folder, "trips.csv");
        File.WriteAllText(trips, "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note\n"
            + "X-01,2026-03-18T12:00,as-found,all,40.9,75,,cold,30,,,\n");
        CliRun.Run("import", register, trips, "--db", db);

        var (exit, output, _) = CliRun.Run("findings", "--csv", "--db", db);

        Assert.Equal(0, exit);
        var row = output.Split('\n')[1];
        Assert.StartsWith("X-01,\"'=HYPERLINK(\"\"http://example.invalid\"\")\",trip-out-of-band,out-of-service,open", row);
    }
}
