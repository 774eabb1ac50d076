using TripTestLog.Ingest.Tests.Stores;
using TripTestLog.Storage.Postgres;

namespace TripTestLog.Cli.Tests.Stores;

/// <summary>
/// The demo's database and, for each store, a copy of it made by `transfer`: a second SQLite file, and a schema of its
/// own on the test server. Each copy is made once, when a test first asks for it.
/// </summary>
public sealed class CopiedFleet : IDisposable
{
    private readonly SampleFleetDatabase _fleet = new();
    private readonly Dictionary<Provider, TestDatabase> _copies = [];
    private readonly Lock _gate = new();

    /// <summary>The demo's SQLite database.</summary>
    public string Original => _fleet.Database;

    /// <summary>The copy in <paramref name="provider"/>'s store, made by `transfer --from` the demo's database.</summary>
    internal TestDatabase Copy(Provider provider)
    {
        lock (_gate)
        {
            if (!_copies.TryGetValue(provider, out var copy))
            {
                var folder = Path.Combine(_fleet.Folder, "copy-" + provider.ToString().ToLowerInvariant());
                Directory.CreateDirectory(folder);
                copy = TestDatabase.Create(provider, folder);
                var (exit, _, error) = CliRun.Run("transfer", "--from", Original, "--to", copy.Address);
                if (exit != 0)
                {
                    throw new InvalidOperationException("the transfer failed: " + error);
                }

                _copies[provider] = copy;
            }

            return copy;
        }
    }

    /// <summary>How commands name a database: the file's full path, or the server without a password.</summary>
    internal static string Shown(TestDatabase database) =>
        database.Provider == Provider.Sqlite ? Path.GetFullPath(database.Address) : ServerAddress.Parse(database.Address, fromCommandLine: false).Display;

    public void Dispose()
    {
        foreach (var copy in _copies.Values)
        {
            copy.Dispose();
        }

        _fleet.Dispose();
    }
}
