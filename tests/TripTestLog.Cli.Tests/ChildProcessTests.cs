using System.Diagnostics;
using System.Globalization;
using System.Text;
using Microsoft.Data.Sqlite;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// Real processes against one real database, on each store: an import killed halfway leaves the database consistent
/// and the next import completes it; two imports at once both finish; two machines importing the same file at the same
/// moment end with one copy. These take a few seconds each.
/// </summary>
public sealed class ChildProcessTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-proc-" + Guid.NewGuid().ToString("N")[..12]);
    private readonly string _application = "ttl-proc-" + Guid.NewGuid().ToString("N")[..12];
    private TestDatabase? _database;

    public ChildProcessTests() => Directory.CreateDirectory(_folder);

    private TestDatabase Database => _database!;

    // What the child processes are given: on the server, a connection string that names this test's sessions.
    private string Db => Database.Provider == Provider.Sqlite ? Database.Address : Database.Address + ";Application Name=" + _application;

    public void Dispose()
    {
        _database?.Dispose();
        SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AnImportKilledHalfway_LeavesNothingHalfDone_AndTheNextImportCompletesIt(Provider provider)
    {
        _database = TestDatabase.Create(provider, _folder);
        Assert.Equal(0, Cli("import", Register(), "--db", Db).WaitForExitCode());
        var big = Trips("big.csv", 300_000, 0);

        using (var child = Cli("import", big, "--db", Db))
        {
            // Kill mid-write, not before or after: SQLite once the transaction has spilled pages into the write-ahead
            // log; the server once the import's transaction has written and its rows are being copied in.
            Assert.True(WaitFor(() => Writing() || child.HasExited, TimeSpan.FromSeconds(120)), "the import never started writing");
            Assert.False(child.HasExited, "the import finished before it could be killed; make the file larger");
            child.Kill(entireProcessTree: true);
            child.WaitForExit();
        }

        if (provider == Provider.Sqlite)
        {
            Assert.Equal("ok", Database.Scalar("PRAGMA integrity_check"));
        }
        else
        {
            Assert.True(WaitFor(() => Database.Count($"SELECT COUNT(*) FROM pg_stat_activity WHERE application_name = '{_application}'") == 0, TimeSpan.FromSeconds(30)),
                "the killed import's session never ended");
        }

        Assert.Equal((0L, 1L), (Database.Count("SELECT COUNT(*) FROM trip_tests"), Database.Count("SELECT COUNT(*) FROM source_files")));

        var again = Cli("import", big, "--db", Db);
        Assert.Equal(0, again.WaitForExitCode());
        Assert.Equal((300_000L, 2L), (Database.Count("SELECT COUNT(*) FROM trip_tests"), Database.Count("SELECT COUNT(*) FROM source_files")));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TwoImportsAtOnce_OfOverlappingFiles_BothFinish_WithNoRowLostOrStoredTwice(Provider provider)
    {
        _database = TestDatabase.Create(provider, _folder);
        Assert.Equal(0, Cli("import", Register(), "--db", Db).WaitForExitCode());

        // The second file's first half is the first file's second half: 150,000 distinct measurements in all.
        var a = Trips("a.csv", 100_000, 0);
        var b = Trips("b.csv", 100_000, 50_000);

        using var first = Cli("import", a, "--db", Db);
        using var second = Cli("import", b, "--db", Db);

        Assert.Equal((0, 0), (first.WaitForExitCode(), second.WaitForExitCode()));
        Assert.Equal((150_000L, 3L), (Database.Count("SELECT COUNT(*) FROM trip_tests"), Database.Count("SELECT COUNT(*) FROM source_files")));
        Assert.Equal((150_000L, 50_000L), (Database.Count("SELECT CAST(SUM(records_added) AS BIGINT) FROM source_files WHERE kind = 'trip-tests'"),
            Database.Count("SELECT CAST(SUM(duplicates) AS BIGINT) FROM source_files WHERE kind = 'trip-tests'")));
        if (provider == Provider.Sqlite)
        {
            Assert.Equal("ok", Database.Scalar("PRAGMA integrity_check"));
        }
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TwoLabsImportingTheSameFileAtOnce_EndWithOneCopy(Provider provider)
    {
        _database = TestDatabase.Create(provider, _folder);
        Assert.Equal(0, Cli("import", Register(), "--db", Db).WaitForExitCode());
        var original = Trips("lab-a.csv", 100_000, 0);
        var copy = Path.Combine(_folder, "lab-b.csv");
        File.Copy(original, copy);

        using var first = Cli("import", original, "--db", Db);
        using var second = Cli("import", copy, "--db", Db);

        // Both succeed: one stores the file, the other finds it already imported.
        Assert.Equal((0, 0), (first.WaitForExitCode(), second.WaitForExitCode()));
        Assert.Equal((100_000L, 2L), (Database.Count("SELECT COUNT(*) FROM trip_tests"), Database.Count("SELECT COUNT(*) FROM source_files")));
        Assert.Equal(0L, Database.Count("SELECT COUNT(*) FROM source_files WHERE sha256 LIKE 'pending:%'"));
    }

    private string Register()
    {
        var path = Path.Combine(_folder, "register.csv");
        File.WriteAllText(path, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\nP-01,Process Site,Board 1,iec60898,C,16,1,230\n");
        return path;
    }

    // Distinct rows, one second apart from the offset: each is a new measurement.
    private string Trips(string name, int rows, int offsetSeconds)
    {
        var path = Path.Combine(_folder, name);
        var start = new DateTime(2020, 1, 1);
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n");
        for (var i = 0; i < rows; i++)
        {
            var at = start.AddSeconds(offsetSeconds + i).ToString("yyyy-MM-ddTHH:mm:ss", CultureInfo.InvariantCulture);
            sb.Append("P-01,").Append(at).Append(",as-found,all,40.9,").Append((10 + (offsetSeconds + i) % 40).ToString(CultureInfo.InvariantCulture)).Append(",,cold\n");
        }

        File.WriteAllText(path, sb.ToString());
        return path;
    }

    private static Process Cli(params string[] args)
    {
        var info = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        info.ArgumentList.Add(Path.Combine(AppContext.BaseDirectory, "triptestlog.dll"));
        foreach (var arg in args)
        {
            info.ArgumentList.Add(arg);
        }

        var process = Process.Start(info)!;
        process.OutputDataReceived += (_, _) => { };
        process.ErrorDataReceived += (_, _) => { };
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        return process;
    }

    private bool Writing() => Database.Provider == Provider.Sqlite
        ? File.Exists(Db + "-wal") && new FileInfo(Db + "-wal").Length > 2_000_000
        : Database.Count("SELECT COUNT(*) FROM pg_stat_activity WHERE application_name = '" + _application
            + "' AND backend_xid IS NOT NULL AND query LIKE 'COPY%'") > 0;

    private static bool WaitFor(Func<bool> condition, TimeSpan limit)
    {
        var watch = Stopwatch.StartNew();
        while (!condition())
        {
            if (watch.Elapsed > limit)
            {
                return false;
            }

            Thread.Sleep(10);
        }

        return true;
    }
}

internal static class ProcessExtensions
{
    public static int WaitForExitCode(this Process process)
    {
        if (!process.WaitForExit(TimeSpan.FromMinutes(5)))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("the child import did not finish within 5 minutes");
        }

        return process.ExitCode;
    }
}
