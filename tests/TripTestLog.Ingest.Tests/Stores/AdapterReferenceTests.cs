using System.Xml.Linq;

namespace TripTestLog.Ingest.Tests.Stores;

/// <summary>
/// The shape of the storage layer: one shared store that knows no database, and one adapter a database that knows only
/// the shared store, so a third database is one more adapter beside them.
/// </summary>
public sealed class AdapterReferenceTests
{
    [Theory]
    [InlineData("TripTestLog.Storage.Sqlite", "Microsoft.EntityFrameworkCore.Sqlite")]
    [InlineData("TripTestLog.Storage.Postgres", "Npgsql.EntityFrameworkCore.PostgreSQL")]
    public void EachAdapter_ReferencesOnlyTheSharedStore_AndItsOwnProvider(string adapter, string provider)
    {
        var (projects, packages) = References(adapter);

        Assert.Equal(["TripTestLog.Storage"], projects);
        Assert.Equal([provider], packages);
    }

    [Fact]
    public void TheSharedStore_NamesNoDatabaseProvider()
    {
        var (projects, packages) = References("TripTestLog.Storage");

        Assert.Equal(["Microsoft.EntityFrameworkCore.Relational"], packages);
        Assert.DoesNotContain(projects, p => p.StartsWith("TripTestLog.Storage.", StringComparison.Ordinal));
        var sources = Directory.EnumerateFiles(Path.Combine(Root(), "src", "TripTestLog.Storage"), "*.cs", SearchOption.AllDirectories)
            .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal));
        Assert.All(sources, f => Assert.DoesNotContain("Npgsql", File.ReadAllText(f), StringComparison.Ordinal));
        Assert.All(sources, f => Assert.DoesNotContain("Microsoft.Data.Sqlite", File.ReadAllText(f), StringComparison.Ordinal));
    }

    private static (List<string> Projects, List<string> Packages) References(string project)
    {
        var file = XDocument.Load(Path.Combine(Root(), "src", project, project + ".csproj"));
        var projects = file.Descendants("ProjectReference").Select(r => Path.GetFileNameWithoutExtension(r.Attribute("Include")!.Value.Replace('\\', '/'))).ToList();
        var packages = file.Descendants("PackageReference").Select(r => r.Attribute("Include")!.Value).ToList();
        return (projects, packages);
    }

    private static string Root()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "TripTestLog.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("the repository root (TripTestLog.sln) was not found above the test's folder");
    }
}
