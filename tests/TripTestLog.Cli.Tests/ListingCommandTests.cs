using System.Text.Json;

namespace TripTestLog.Cli.Tests;

/// <summary>`devices`, `instruments` and `history` on the sample fleet, and a device's corrections on a database of its own.</summary>
public sealed class ListingCommandTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    [Fact]
    public void Devices_ListsTheSettingsInForce_SiteBySite()
    {
        var (exit, output, _) = CliRun.Run("devices", "--db", fleet.Database, "--site", "Alder Ridge Works");
        var (_, before, _) = CliRun.Run("devices", "--db", fleet.Database, "--site", "Alder Ridge Works", "--as-of", "2022-06-01");

        Assert.Equal(0, exit);
        Golden.Matches("devices-alder-ridge.txt", output);

        // ARW-MSB-Q01's register gives Ir 400 A from the start and Ir 500 A from 2023-02-01.
        Assert.Contains("Ir 500 A", output.Split('\n').Single(l => l.StartsWith("ARW-MSB-Q01", StringComparison.Ordinal)));
        Assert.Contains("Ir 400 A", before.Split('\n').Single(l => l.StartsWith("ARW-MSB-Q01", StringComparison.Ordinal)));
    }

    [Fact]
    public void Devices_Json_HasOneObjectPerDevice()
    {
        var (exit, output, _) = CliRun.Run("devices", "--db", fleet.Database, "--json");

        Assert.Equal(0, exit);
        var devices = JsonDocument.Parse(output).RootElement.EnumerateArray().ToList();
        Assert.Equal(58, devices.Count);
        var q01 = devices.Single(d => d.GetProperty("asset_tag").GetString() == "ARW-MSB-Q01");
        Assert.Equal(2, q01.GetProperty("register_entries").GetInt32());
        Assert.Equal("iec60947-electronic", q01.GetProperty("family").GetString());
        Assert.Equal(630, q01.GetProperty("rated_current_a").GetDouble());
    }

    [Fact]
    public void Instruments_SayWhichAreInCalibrationOnTheDate()
    {
        var (exit, output, _) = CliRun.Run("instruments", "--db", fleet.Database);
        var (_, later, _) = CliRun.Run("instruments", "--db", fleet.Database, "--as-of", "2027-02-01");

        Assert.Equal(0, exit);
        Golden.Matches("instruments.txt", output);

        // The sample calibrations run to 2027-01-14; two weeks later they have lapsed.
        Assert.Contains("LAPSED 18 days ago", later.Split('\n').Single(l => l.StartsWith("INJ-ARW-1 ", StringComparison.Ordinal)));
    }

    [Fact]
    public void History_ShowsEachRegisterEntry_AndEveryCorrectionOfTheDevicesRecords()
    {
        var folder = Path.Combine(fleet.Folder, "history");
        Directory.CreateDirectory(folder);
        var db = Path.Combine(folder, "h.db");
        var trips = Path.Combine(folder, "trips.csv");
        const string Header = "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note";
        File.WriteAllLines(trips, [Header, "ARW-DB1-Q03,2026-03-06T11:00,as-found,all,40.9,22.5,,cold,18.9,INJ-ARW-1,T. Adeyemi,"]);
        Assert.Equal(0, CliRun.Run("import", Path.Combine(Golden.RepositoryRoot(), "sample-records", "device-register.csv"), trips, "--db", db).Exit);
        File.WriteAllLines(trips, [Header, "ARW-DB1-Q03,2026-03-06T11:00,as-found,all,40.9,25,,cold,18.9,INJ-ARW-1,T. Adeyemi,"]);
        var (replaceExit, replaceOut, _) = CliRun.Run("import", trips, "--db", db, "--replace", trips);
        Assert.Equal(0, replaceExit);
        Assert.Contains("trips.csv: 1 record took new values (old ones in the audit table), 0 unchanged, 0 added.",
            System.Text.RegularExpressions.Regex.Replace(replaceOut, @"\s+", " "));

        var (exit, output, _) = CliRun.Run("history", "--db", db, "--asset", "ARW-DB1-Q03");
        var (_, msb, _) = CliRun.Run("history", "--db", fleet.Database, "--asset", "ARW-MSB-Q01");

        Assert.Equal(0, exit);
        Assert.Contains("Corrections applied with import --replace (1), oldest first:", output);
        Assert.Contains("trip test 2026-03-06T11:00:00 at 40.9 A: trip_time_s 22.5 -> 25", output);
        Assert.Contains("Register entries (2), oldest first:", msb);
        Assert.Contains("in force from 2023-02-01: device-register.csv:43", msb);
        Assert.Contains("No record of this device has been corrected.", msb);
    }

    [Theory]
    [InlineData(new[] { "history" }, "Option '--asset' is required")]
    [InlineData(new[] { "history", "--asset", "NOPE-9" }, "error: --asset: 'NOPE-9' is not in the device register")]
    [InlineData(new[] { "devices", "--site", "Nowhere" }, "error: --site: no device in the register is at 'Nowhere'")]
    [InlineData(new[] { "instruments", "--as-of", "someday" }, "error: --as-of: expected a date as YYYY-MM-DD")]
    public void AMistake_GetsOnePlainSentence(string[] args, string expected)
    {
        var (exit, output, error) = CliRun.Run([.. args, "--db", fleet.Database]);

        Assert.Equal(2, exit);
        Assert.Contains(expected, error);
        Assert.DoesNotContain("   at ", error + output);
    }
}
