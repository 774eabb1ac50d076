using Microsoft.Data.Sqlite;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests;

/// <summary>
/// The check reader streams device by device from an index: SQLite sorts one device's tests at a time (the last three
/// terms of the ORDER BY, within each asset tag), never the whole table.
/// </summary>
public sealed class ReaderPlanTests
{
    [Fact]
    public void TheTripReader_WalksDevicesInTagOrder_AndSortsOnlyEachDevicesTests()
    {
        using var temp = new TempFolder();
        using (RecordStore.Open(temp.Database))
        {
        }

        using var connection = new SqliteConnection($"Data Source={temp.Database};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = "EXPLAIN QUERY PLAN " + RecordStore.TripsInDeviceOrder;
        command.Parameters.AddWithValue("$tag", DBNull.Value);
        using var reader = command.ExecuteReader();
        var plan = new List<string>();
        while (reader.Read())
        {
            plan.Add(reader.GetString(3));
        }

        Assert.Equal("SCAN d USING COVERING INDEX IX_devices_asset_tag", plan[0]);
        Assert.Contains(plan, step => step.StartsWith("SEARCH t USING INDEX IX_trip_tests_device (device_id=?)", StringComparison.Ordinal));
        Assert.DoesNotContain(plan, step => step == "USE TEMP B-TREE FOR ORDER BY");
        Assert.Contains(plan, step => step == "USE TEMP B-TREE FOR LAST 3 TERMS OF ORDER BY");
    }
}
