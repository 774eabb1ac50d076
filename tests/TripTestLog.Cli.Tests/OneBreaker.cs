namespace TripTestLog.Cli.Tests;

/// <summary>
/// A database of one 16 A curve C breaker (IEC 60898-1) with one as-found trip test: held 3600 s at 18.08 A (1.13 In)
/// from cold, which proves Table 7 a (no trip at t &lt;= 1 h).
/// </summary>
internal static class OneBreaker
{
    /// <summary>Writes the two CSV files into <paramref name="folder"/>, imports them into a new database there and returns its path.</summary>
    public static string Database(string folder, string name = "t.db")
    {
        var db = Path.Combine(folder, name);
        var register = Path.Combine(folder, "register.csv");
        File.WriteAllText(register,
            "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial\n"
            + "F-01,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,,,\n");
        var trips = Path.Combine(folder, "trips.csv");
        File.WriteAllText(trips,
            "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note\n"
            + "F-01,2026-03-06T08:00,as-found,all,18.08,,3600,cold,20,INJ-1,A. O'Tester,\n");
        Assert.Equal(0, CliRun.Run("import", register, trips, "--db", db).Exit);
        return db;
    }
}
