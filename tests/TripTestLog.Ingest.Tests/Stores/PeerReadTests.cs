using TripTestLog.Domain.Devices;

namespace TripTestLog.Ingest.Tests.Stores;

/// <summary>
/// One device's findings read only the devices that can share a peer group with it: a family and a rated current in
/// common with one of its register entries, whatever the tag's case. The register below is invented for the test.
/// </summary>
public sealed class PeerReadTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    private const string Register = """
        asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial
        P-01,Test Site,Way 1,iec60898,C,16,1,230,,,,,
        P-02,Test Site,Way 2,iec60898,B,16,1,230,,,,,
        P-03,Test Site,Way 3,iec60898,C,20,1,230,,,,,
        P-04,Test Site,Way 4,iec60898,C,16,1,230,,,,,
        """;

    // P-03 was a 16 A way before it was re-rated, so it can share P-01's groups in its older tests.
    private const string Rerated = """
        asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial
        P-03,Test Site,Way 3,iec60898,C,16,1,230,,,,,
        """;

    private const string Trips = """
        asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start
        P-01,2025-05-01T09:00,as-found,all,160,0.01,,cold
        P-02,2025-05-01T09:00,as-found,all,160,0.01,,cold
        P-03,2025-05-01T09:00,as-found,all,200,0.01,,cold
        P-04,2025-05-01T09:00,as-found,all,160,0.01,,cold
        P-04,2025-05-02T09:00,as-found,all,160,0.01,,cold
        """;

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ThePeersOfADevice_AreTheDevicesSharingAFamilyAndARating_WithTheirTrips(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        store.Import(temp.Write("register.csv", Register), Now);
        store.Import(temp.Write("trips.csv", Trips), Now);

        var peers = store.PeersOf(AssetTag.Of("p-01")).ToList();

        Assert.Equal(["P-01", "P-02", "P-04"], peers.Select(d => d.History.Latest.Tag.Value));
        Assert.Equal([1, 1, 2], peers.Select(d => d.Trips.Count));
        Assert.Equal(["P-03"], store.PeersOf(AssetTag.Of("P-03")).Select(d => d.History.Latest.Tag.Value));

        // A register revision that once gave P-03 the same rating makes it a possible peer, with its whole history.
        store.Import(temp.Write("rerated.csv", Rerated), Now.AddDays(1));
        Assert.Equal(["P-01", "P-02", "P-03", "P-04"], store.PeersOf(AssetTag.Of("P-01")).Select(d => d.History.Latest.Tag.Value));
        Assert.Equal(2, store.PeersOf(AssetTag.Of("P-01")).Single(d => d.History.Latest.Tag.Value == "P-03").History.Entries.Count);
    }
}
