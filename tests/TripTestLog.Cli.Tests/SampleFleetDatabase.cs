namespace TripTestLog.Cli.Tests;

/// <summary>The demo's database, built once from the committed sample records for the tests of one class.</summary>
public sealed class SampleFleetDatabase : IDisposable
{
    public SampleFleetDatabase()
    {
        Folder = Path.Combine(Path.GetTempPath(), "ttl-fleet-" + Guid.NewGuid().ToString("N")[..12]);
        var (exit, _, error) = CliRun.Run("demo", "--records", Path.Combine(Golden.RepositoryRoot(), "sample-records"), "--out", Folder);
        if (exit != 0)
        {
            throw new InvalidOperationException("the demo failed: " + error);
        }
    }

    public string Folder { get; }

    public string Database => Path.Combine(Folder, "triptestlog.db");

    /// <summary>Output with this run's temporary folder replaced, so it can be compared with a golden file.</summary>
    public string Portable(string output) => output.Replace(Folder, "<demo>", StringComparison.Ordinal);

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        if (Directory.Exists(Folder))
        {
            Directory.Delete(Folder, recursive: true);
        }
    }
}
