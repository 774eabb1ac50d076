using System.Text.Json;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// `findings --asset` reads only the devices that can share a peer group with the device asked about; its answer must be
/// the one the whole fleet's run gives that device, peer findings included (CWD-DB1-Q04 is the sample's peer outlier).
/// </summary>
public sealed class OneDeviceFindingsTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    [Fact]
    public void EachDevicesFindings_AreTheSameAskedAlone_AsInTheWholeFleetsRun()
    {
        var whole = JsonDocument.Parse(CliRun.Run("findings", "--json", "--include-closed", "--as-of", "2026-12-01", "--db", fleet.Database).Out).RootElement;
        var byDevice = whole.EnumerateArray().GroupBy(f => f.GetProperty("asset_tag").GetString()!).ToDictionary(g => g.Key, g => g.Select(f => f.GetRawText()).ToList());
        Assert.Contains(whole.EnumerateArray(), f => f.GetProperty("kind").GetString() == "peer-outlier" && f.GetProperty("asset_tag").GetString() == "CWD-DB1-Q04");

        var tags = CliRun.Run("devices", "--json", "--db", fleet.Database).Out;
        var devices = JsonDocument.Parse(tags).RootElement.EnumerateArray().Select(d => d.GetProperty("asset_tag").GetString()!).ToList();
        Assert.Equal(58, devices.Count);
        foreach (var tag in devices)
        {
            var alone = JsonDocument.Parse(CliRun.Run("findings", "--json", "--include-closed", "--as-of", "2026-12-01", "--asset", tag, "--db", fleet.Database).Out).RootElement;
            Assert.Equal(byDevice.GetValueOrDefault(tag) ?? [], alone.EnumerateArray().Select(f => f.GetRawText()).ToList());
        }
    }
}
