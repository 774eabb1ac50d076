using TripTestLog.Application.Records;
using TripTestLog.Application.Stores;
using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Settings;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests;

/// <summary>A database written by an older release opens, upgrades in place and keeps every record (schemas/README.md).</summary>
public sealed class SchemaUpgradeTests
{
    [Fact]
    public void TheMigrationsReadFromTheirAttributes_AreTheOnesEfCoreWouldApply()
    {
        // Opening a store compares the history table with the migrations read from the assembly's attributes, so that
        // EF Core is started only to migrate; the two lists must be the same, in the same order.
        using var connection = new SqliteConnection("Data Source=:memory:");
        using var context = new TripTestLogContext(StoreOptions.For(connection));
        var efCore = Microsoft.EntityFrameworkCore.RelationalDatabaseFacadeExtensions.GetMigrations(context.Database).ToList();

        Assert.NotEmpty(efCore);
        Assert.Equal(efCore, SqliteSchema.Known);
        Assert.Equal(efCore, MigrationIds.In("TripTestLog.Migrations"));

        // The server's migrations likewise; listing them opens no connection.
        using var server = new Npgsql.NpgsqlConnection();
        using var serverContext = new TripTestLogContext(TripTestLog.Storage.Postgres.ServerStoreOptions.For(server));
        var serverMigrations = Microsoft.EntityFrameworkCore.RelationalDatabaseFacadeExtensions.GetMigrations(serverContext.Database).ToList();
        Assert.NotEmpty(serverMigrations);
        Assert.Equal(serverMigrations, TripTestLog.Storage.Postgres.ServerSchema.Known);
    }

    [Fact]
    public void ASchema1Database_UpgradesWithItsRecordsIntact()
    {
        using var temp = new TempFolder();
        var db = Path.Combine(temp.Path, "old.db");
        File.Copy(Path.Combine(AppContext.BaseDirectory, "schemas", "schema-1.db"), db);
        Assert.Equal(["20261201223055_InitialSchema"], Migrations(db));

        using var store = RecordStore.Open(db);

        Assert.Contains(store.AppliedMigrations(), m => m.EndsWith("_DeviceFamiliesAndTables", StringComparison.Ordinal));
        Assert.Equal(new StoreCounts(4, 2, 4, 1, 1), store.Counts());
        var histories = store.Histories();
        Assert.Equal(TripCurve.C, Assert.IsType<Iec60898Settings>(histories["OLD-01"].Latest.Settings).Curve);
        Assert.Equal(TripCurve.B, Assert.IsType<Iec60898Settings>(histories["OLD-02"].Latest.Settings).Curve);
        var trips = store.Trips();
        Assert.Equal([18.2, 23.3, 40.9, 400.5], trips.Select(t => t.Measurement.Current.Value));
        Assert.Equal("drifting", trips[2].Measurement.Note);
    }

    [Fact]
    public void ASchema2Database_UpgradesWithItsSettingsHistoryTablesAndFoundSettingsIntact()
    {
        using var temp = new TempFolder();
        var db = Path.Combine(temp.Path, "old.db");
        File.Copy(Path.Combine(AppContext.BaseDirectory, "schemas", "schema-2.db"), db);
        Assert.EndsWith("_DeviceFamiliesAndTables", Migrations(db)[^1]);

        using var store = RecordStore.Open(db);

        Assert.EndsWith("_RecordKindCodes", store.AppliedMigrations()[^1]);
        var histories = store.Histories();
        Assert.Equal(2, histories["TWO-01"].Entries.Count);
        Assert.Equal(500, Assert.IsType<ElectronicTripSettings>(histories["TWO-01"].InForceOn(new DateOnly(2024, 6, 1)).Settings).Ir.Value);
        Assert.Equal(IdmtCurve.StandardInverse, Assert.IsType<RelaySettings>(histories["TWO-02"].Latest.Settings).Curve);
        Assert.Equal(3, store.CurveTables()["SPECIAL"].Points.Count);
        var trips = store.Trips();
        Assert.Equal(4, trips.Count);
        Assert.Equal(420, trips.Single(t => t.Measurement.Note == "dial found low").Measurement.FoundSettings!.Ir!.Value.Value);
        Assert.True(store.Verify().IntegrityErrors.Count == 0);
    }

    [Fact]
    public void AnOlderDatabase_KeepsTheKindOfEachFileAsItsCode_AfterTheUpgrade()
    {
        using var temp = new TempFolder();
        var db = Path.Combine(temp.Path, "old.db");
        File.Copy(Path.Combine(AppContext.BaseDirectory, "schemas", "schema-3.db"), db);
        Assert.Contains("TripTests", Kinds(db));

        using (var store = RecordStore.Open(db))
        {
            // Every kind read back is the kind it was, from its code.
            Assert.Equal(Kinds(db).Select(RecordKindCodes.Book.Decode), store.Files().Select(f => f.Kind));
        }

        Assert.All(Kinds(db), k => Assert.Contains(k, RecordKindCodes.Book.All));
        Assert.Contains("trip-tests", Kinds(db));

        // A kind no version wrote is refused by name rather than read as another.
        Sql.Execute(db, "UPDATE source_files SET kind = 'TripTests' WHERE id = 1");
        using var again = RecordStore.Open(db);
        Assert.Contains("unknown record kind 'TripTests'", Assert.Throws<InvalidDataException>(() => again.Files().ToList()).Message, StringComparison.Ordinal);
    }

    private static List<string> Kinds(string db)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        using var select = connection.CreateCommand();
        select.CommandText = "SELECT kind FROM source_files ORDER BY id";
        using var reader = select.ExecuteReader();
        var kinds = new List<string>();
        while (reader.Read())
        {
            kinds.Add(reader.GetString(0));
        }

        return kinds;
    }

    [Fact]
    public void ASchema3Database_UpgradesItsIndexAndFingerprints_AndItsRowsStillCountAsDuplicates()
    {
        using var temp = new TempFolder();
        var db = Path.Combine(temp.Path, "old.db");
        File.Copy(Path.Combine(AppContext.BaseDirectory, "schemas", "schema-3.db"), db);
        Assert.EndsWith("_InstrumentsAndAudit", Migrations(db)[^1]);
        var again = temp.Write("trips-again.csv", File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "schemas", "schema-3-source", "trips.csv")) + "\n");

        using var store = RecordStore.Open(db);
        var outcome = store.Import(again, DateTimeOffset.UtcNow);

        Assert.EndsWith("_RecordKindCodes", store.AppliedMigrations()[^1]);
        Assert.Equal(5, store.Trips().Count);

        // The files imported before full paths were kept apart keep their full path, which was their name, to verify by.
        Assert.Equal(0, Sql.Count(db, "SELECT COUNT(*) FROM source_files WHERE full_path = '' OR (id < 3 AND full_path <> file_name)"));
        Assert.Equal((0L, 4L), (outcome.Added, outcome.Duplicates));
        Assert.Null(store.Instruments().Check("INJ-1", new DateOnly(2022, 12, 1), requireRegistered: true));
        Assert.True(store.Verify().IntegrityErrors.Count == 0);
    }

    private static List<string> Migrations(string db)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = "SELECT MigrationId FROM __EFMigrationsHistory ORDER BY MigrationId";
        using var reader = command.ExecuteReader();
        var ids = new List<string>();
        while (reader.Read())
        {
            ids.Add(reader.GetString(0));
        }

        return ids;
    }
}
