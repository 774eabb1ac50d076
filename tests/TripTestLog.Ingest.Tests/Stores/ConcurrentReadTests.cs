using System.Globalization;
using System.Text;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Ingest.Tests.Stores;

/// <summary>A reader part-way through the streaming read neither blocks an import on another connection nor sees it.</summary>
public sealed class ConcurrentReadTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public async Task AReaderMidStream_NeitherBlocksAnImport_NorSeesItHalfway(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var reader = db.Open();
        reader.Import(temp.Write("register.csv", Records.Register), Now);
        reader.Import(temp.Write("trips.csv", Records.Trips), Now);

        // The reader takes the first device (T-01, three tests) and holds its place before T-02.
        using var devices = reader.Devices().GetEnumerator();
        Assert.True(devices.MoveNext());
        Assert.Equal(3, devices.Current.Trips.Count);

        // Meanwhile another connection (another machine) imports a test of T-02; it must finish, not wait for the reader.
        using var writer = db.Open();
        var import = Task.Run(() => writer.Import(temp.Write("more.csv", Trips("T-02", 4)), Now));
        Assert.True(await Task.WhenAny(import, Task.Delay(TimeSpan.FromSeconds(60))) == import, "the import waited on the reader");
        Assert.Equal(4L, (await import).Added);

        // The reader goes on in the state it began in; a new read sees the import whole.
        Assert.True(devices.MoveNext());
        Assert.Equal((AssetTag.Of("T-02"), 0), (devices.Current.History.Latest.Tag, devices.Current.Trips.Count));
        devices.Dispose();
        Assert.Equal(4, reader.Trips(AssetTag.Of("T-02")).Count);
    }

    private static string Trips(string tag, int rows)
    {
        var sb = new StringBuilder("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start\n");
        for (var i = 0; i < rows; i++)
        {
            sb.Append(tag).Append(",2025-05-0").Append((i + 1).ToString(CultureInfo.InvariantCulture)).Append("T09:00,as-found,all,400,0.01,,cold\n");
        }

        return sb.ToString();
    }
}
