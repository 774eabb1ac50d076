using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Storage;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>The cheap first pass judges only each point's latest test, and must give the peer groups full judging gives.</summary>
public sealed class PeerPassTests
{
    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void OnTheSampleFleet_ThePeerPass_GivesTheSameGroupsAsJudgingEveryTest(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        var samples = Path.GetFullPath(Path.Combine(AppContext.BaseDirectory, "..", "..", "..", "..", "..", "sample-records"));
        foreach (var file in new[] { "device-register.csv", "curve-tables.csv", "ambient-tables.csv", "instruments.csv" }
            .Select(f => Path.Combine(samples, f))
            .Concat(Directory.GetFiles(samples, "*trip-tests.csv", SearchOption.AllDirectories).Order(StringComparer.Ordinal)))
        {
            Assert.Equal(Application.Import.ImportStatus.Imported, store.Import(file, new DateTimeOffset(2026, 12, 1, 9, 0, 0, TimeSpan.Zero)).Status);
        }

        var judge = DeviceJudge.For(store, false);
        var cheap = new PeerGroups();
        var full = new PeerGroups();
        var positions = 0;
        foreach (var device in store.Devices())
        {
            PeerPass.Add(device, judge, cheap);
            foreach (var (point, latest, position) in TripRules.Positions(judge.Judge(device).ToList()))
            {
                full.Add(PeerGroups.GroupOf(latest.Device, point).Key, position);
                positions++;
            }
        }

        cheap.Seal();
        full.Seal();

        // Only points with both edges closed have a place in the band (2.55 In, not the magnetic points whose minimum is 0).
        Assert.True(positions >= 57, $"only {positions} positions");
        Assert.Equal(full.Keys.Order(StringComparer.Ordinal), cheap.Keys.Order(StringComparer.Ordinal));
        Assert.All(full.Keys, key => Assert.Equal(full.Of(key), cheap.Of(key)));
    }
}
