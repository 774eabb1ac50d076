using System.Diagnostics;
using System.Globalization;
using System.Text;
using Microsoft.Data.Sqlite;

namespace TripTestLog.Cli.Tests.Opening;

/// <summary>
/// A database on a disk that fills up during an import: a real file system of 1 MiB (a tmpfs mounted for the test,
/// which needs root, as the tests that switch user do), so SQLite itself reports the disk full. The person is told
/// which database, which file did not fit and what is stored; nothing of that file is kept, and after space is freed
/// the same command finishes the work.
/// </summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")]
public sealed class FullDiskTests : IDisposable
{
    private readonly string _work = Path.Combine(Path.GetTempPath(), "ttl-full-" + Guid.NewGuid().ToString("N")[..12]);
    private readonly string _disk;
    private bool _mounted;

    public FullDiskTests()
    {
        _disk = Path.Combine(_work, "disk");
        Directory.CreateDirectory(_disk);
    }

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        if (_mounted)
        {
            Run("umount", _disk);
        }

        Directory.Delete(_work, recursive: true);
    }

    [Fact]
    public void AnImportThatFillsTheDisk_NamesTheDatabaseAndTheFile_SaysWhatIsStored_AndKeepsNothingOfThatFile()
    {
        Assert.True(Environment.UserName == "root", "this test mounts a 1 MiB file system, which needs root");
        Assert.True(Run("mount", "-t", "tmpfs", "-o", "size=1m", "tmpfs", _disk) == 0, "could not mount a tmpfs for the test");
        _mounted = true;
        var db = Path.Combine(_disk, "lab.db");
        var register = Path.Combine(_work, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\nP-01,Hill Farm,Board 1,iec60898,C,16,1,230\n");
        var big = Trips(Path.Combine(_work, "big.csv"), 30_000);

        var (exit, output, error) = CliRun.Run("import", register, big, "--db", db);

        Assert.Equal(2, exit);
        Assert.Equal($"error: the disk holding {db} is full; nothing of {big} was stored (its transaction was rolled back), and the 1 file "
            + "before it is stored: free space there and import again (files already stored are recognised and skipped)", CliRun.Unwrapped(error));
        Assert.Contains("register.csv  register  imported", output, StringComparison.Ordinal);
        Assert.Equal((1L, 0L, 1L), (Count(db, "SELECT COUNT(*) FROM devices"), Count(db, "SELECT COUNT(*) FROM trip_tests"), Count(db, "SELECT COUNT(*) FROM source_files")));

        Assert.Equal(0, Run("mount", "-o", "remount,size=20m", "tmpfs", _disk));
        var (again, _, againError) = CliRun.Run("import", register, big, "--db", db);

        Assert.True(again == 0, againError);
        Assert.Equal((30_000L, 2L), (Count(db, "SELECT COUNT(*) FROM trip_tests"), Count(db, "SELECT COUNT(*) FROM source_files")));
    }

    [Fact]
    public void AReportThatFillsTheDisk_NamesTheFileItCouldNotWrite_AndLeavesNoHalfWrittenFile()
    {
        Assert.True(Environment.UserName == "root", "this test mounts a small file system, which needs root");
        var db = Path.Combine(_work, "lab.db");
        var register = Path.Combine(_work, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v\nP-01,Hill Farm,Board 1,iec60898,C,16,1,230\n");
        Assert.Equal(0, CliRun.Run("import", register, Trips(Path.Combine(_work, "t.csv"), 20_000), "--db", db).Exit);
        Assert.True(Run("mount", "-t", "tmpfs", "-o", "size=256k", "tmpfs", _disk) == 0, "could not mount a tmpfs for the test");
        _mounted = true;

        var (exit, _, error) = CliRun.Run("report", "--db", db, "--out", _disk);

        Assert.Equal(2, exit);
        var said = CliRun.Unwrapped(error);
        Assert.StartsWith($"error: the disk holding {_disk}/", said, StringComparison.Ordinal);
        Assert.Contains(" is full (or will not let the file grow); it was not written", said, StringComparison.Ordinal);
        Assert.DoesNotContain(".partial", said, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFiles(_disk, "*.partial", SearchOption.AllDirectories));
    }

    // Distinct trip rows one second apart, each a new measurement.
    private static string Trips(string path, int rows)
    {
        var start = new DateTime(2020, 1, 1);
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n");
        for (var i = 0; i < rows; i++)
        {
            sb.Append("P-01,").Append(start.AddSeconds(i).ToString("yyyy-MM-ddTHH:mm:ss", CultureInfo.InvariantCulture))
                .Append(",as-found,all,40.9,").Append((10 + (i % 40)).ToString(CultureInfo.InvariantCulture)).Append(",,cold\n");
        }

        File.WriteAllText(path, sb.ToString());
        return path;
    }

    private static long Count(string db, string sql)
    {
        using var connection = new SqliteConnection($"Data Source={db};Mode=ReadOnly;Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return Convert.ToInt64(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    private static int Run(string program, params string[] args)
    {
        var info = new ProcessStartInfo(program) { UseShellExecute = false, RedirectStandardError = true };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        using var process = Process.Start(info)!;
        process.WaitForExit();
        return process.ExitCode;
    }
}
