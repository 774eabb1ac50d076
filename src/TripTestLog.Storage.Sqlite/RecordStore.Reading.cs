using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
    /// <summary>
    /// The trip query the check reader runs, by device and then test time: its plan is pinned by a test. CROSS JOIN
    /// fixes the join order (SQLite keeps it as written), so devices are walked by their asset-tag index, each device's
    /// tests are found by IX_trip_tests_device and only they are sorted by time: never a sort of the whole table.
    /// </summary>
    internal static string TripsInDeviceOrder { get; } = TripsInDeviceOrderOf(SqliteDialect.Instance);

    private SqliteCommand TagQuery(string sql, AssetTag? only)
    {
        var command = _connection.CreateCommand();
        command.CommandText = sql;
        command.Parameters.AddWithValue("$tag", (object?)only?.Value ?? DBNull.Value);
        return command;
    }
}
