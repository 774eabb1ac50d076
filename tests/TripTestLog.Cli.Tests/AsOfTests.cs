namespace TripTestLog.Cli.Tests;

/// <summary>The date things are judged on comes from --as-of, or from the sample records' own date, never from the machine's clock alone.</summary>
public sealed class AsOfTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-asof-" + Guid.NewGuid().ToString("N")[..12]);

    [Fact]
    public void TheDemo_GivesTheSameAnswer_WhateverTheMachinesClockSays()
    {
        var early = Path.Combine(_folder, "early");
        var late = Path.Combine(_folder, "late");

        // Years before the records were written (an import on today's date would refuse them as future-dated), and after.
        var (earlyExit, earlyOut, earlyError) = CliRun.RunAt(new DateTimeOffset(2019, 3, 1, 9, 0, 0, TimeSpan.Zero), "demo", "--out", early);
        var (lateExit, lateOut, _) = CliRun.RunAt(new DateTimeOffset(2031, 6, 1, 9, 0, 0, TimeSpan.Zero), "demo", "--out", late);

        Assert.True(earlyExit == 0, earlyError + earlyOut);
        Assert.Equal(0, lateExit);
        Assert.Contains("as of 2026-12-01", earlyOut);

        // The summary names what needs attention rather than sending the reader to a file.
        Assert.Contains("Needs attention:\n  BPS-DB1-Q03: too-late on 2026-09-06", earlyOut.ReplaceLineEndings("\n"));
        Assert.Contains("instrument INJ-BPS-1 calibration lapsed on 2025-08-31", earlyOut);
        Assert.Equal(earlyOut.Replace(early, "<out>", StringComparison.Ordinal), lateOut.Replace(late, "<out>", StringComparison.Ordinal));
    }

    [Fact]
    public void Import_AsOf_RefusesRecordsDatedAfterIt()
    {
        Directory.CreateDirectory(_folder);
        var register = Path.Combine(Golden.RepositoryRoot(), "sample-records", "device-register.csv");
        var trips = Path.Combine(_folder, "trips.csv");
        File.WriteAllLines(trips,
        [
            "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note",
            "ARW-DB1-Q03,2026-03-06T11:00,as-found,all,18.18,,3600,cold,18.9,INJ-ARW-1,T. Adeyemi,",
        ]);
        var db = Path.Combine(_folder, "t.db");

        var (exit, output, _) = CliRun.Run("import", register, trips, "--db", db, "--as-of", "2026-01-31");

        Assert.Equal(2, exit);
        Assert.Contains("is after 2026-01-31", output);
        Assert.Equal(0, CliRun.Run("import", trips, "--db", db, "--as-of", "2026-03-06").Exit);
    }

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        if (Directory.Exists(_folder))
        {
            Directory.Delete(_folder, recursive: true);
        }
    }
}
