namespace TripTestLog.Cli.Tests;

/// <summary>The executable reaches a database only through the store seam: the storage adapters are named where a store is chosen and its address read, nowhere else.</summary>
public sealed class StoreSeamTests
{
    [Fact]
    public void OnlyTheStoreOpenerAndTheAddress_NameTheStorageAdapters()
    {
        var cli = Path.Combine(Golden.RepositoryRoot(), "src", "TripTestLog.Cli");

        var naming = Directory.EnumerateFiles(cli, "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .Where(f => File.ReadAllText(f).Contains("TripTestLog.Storage", StringComparison.Ordinal))
            .Select(f => Path.GetRelativePath(cli, f))
            .ToList();

        Assert.Equal([Path.Combine("Services", "StoreAddress.cs"), Path.Combine("Services", "Stores.cs")], naming.Order(StringComparer.Ordinal));
    }
}
