using Microsoft.Data.Sqlite;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests;

/// <summary>The check reader streams device by device in test-time order from an index, with no sort of the whole table.</summary>
public sealed class ReaderPlanTests
{
    [Fact]
    public void TheTripReader_WalksTheDeviceOrderIndex_WithoutATemporarySort()
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

        Assert.Contains(plan, step => step.Contains("IX_trip_tests_device_order", StringComparison.Ordinal));
        Assert.DoesNotContain(plan, step => step.Contains("TEMP B-TREE", StringComparison.Ordinal));
    }
}
