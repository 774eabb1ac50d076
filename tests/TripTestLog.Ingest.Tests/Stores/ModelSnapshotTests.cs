using Microsoft.EntityFrameworkCore;
using TripTestLog.Storage;
using TripTestLog.Storage.Postgres;

namespace TripTestLog.Ingest.Tests.Stores;

/// <summary>
/// The shared model with each database's additions is exactly the model its migrations were made from: a change to
/// the model (or to where a database's own column types are applied) that no migration carries fails here.
/// </summary>
public sealed class ModelSnapshotTests
{
    [Fact]
    public void TheSqliteModel_MatchesItsLastMigration()
    {
        using var connection = StoreOptions.Connect(":memory:");
        using var context = new TripTestLogContext(StoreOptions.For(connection));

        Assert.False(context.Database.HasPendingModelChanges());
        Assert.Equal("", context.Model.FindEntityType(typeof(TripTestLog.Storage.Entities.DeviceRow))!.FindProperty("SettingsJson")!.GetDefaultValue());
    }

    [Fact]
    public void TheServerModel_MatchesItsLastMigration_WithTheServersColumnTypes()
    {
        // Building the model needs no server: the connection is never opened.
        using var connection = new Npgsql.NpgsqlConnection("Host=localhost;Database=model");
        using var context = new TripTestLogContext(ServerStoreOptions.For(connection));

        Assert.False(context.Database.HasPendingModelChanges());
        var trips = context.Model.FindEntityType(typeof(TripTestLog.Storage.Entities.TripTestRow))!;
        Assert.Equal("timestamp without time zone", trips.FindProperty("TestedAt")!.GetColumnType());
        Assert.Equal(ServerColumnTypes.OffsetColumn, trips.FindProperty("TestedOffsetMin")!.GetColumnName());
    }

    [Fact]
    public void EachMeasurementTablesOneColumnList_IsTheModelsColumns()
    {
        using var connection = StoreOptions.Connect(":memory:");
        using var context = new TripTestLogContext(StoreOptions.For(connection));

        foreach (var table in FingerprintCheck.Tables)
        {
            var entity = context.Model.GetEntityTypes().Single(e => e.GetTableName() == table.Table);
            var modelColumns = entity.GetProperties().Select(p => p.GetColumnName()).Order(StringComparer.Ordinal).ToList();

            Assert.Equal(table.Columns.Concat(["id", "source_file_id", "source_line", "fingerprint"]).Order(StringComparer.Ordinal), modelColumns);
            // The reading query selects the device's tag, then columns of this table only.
            Assert.All(table.Selected.Split(", ").Skip(1), c => Assert.Contains(c[(table.Alias.Length + 1)..], modelColumns));
            Assert.Equal(MeasurementTable.TestedAtColumn, table.Ordinal("tested_at"));
        }
    }
}
