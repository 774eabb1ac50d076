using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;
using TripTestLog.Application.Records;
using TripTestLog.Storage;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>Reading real CSV files and storing them in a real SQLite file.</summary>
public sealed class ImportTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    private static ImportOutcome Import(IRecordStore store, string path) => store.Import(RecordFileReader.Read(path, Records.Today), Now);

    private static object? Scalar(string db, string sql)
    {
        using var connection = new SqliteConnection($"Data Source={db};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return command.ExecuteScalar();
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ARegisterAndItsTests_AreStored_WithWhereEachRowCameFrom(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();

        var register = Import(store, temp.Write("register.csv", Records.Register));
        var trips = Import(store, temp.Write("trips.csv", Records.Trips));

        Assert.Equal((ImportStatus.Imported, 2L), (register.Status, register.Added));
        Assert.Equal((ImportStatus.Imported, 3L, 0L), (trips.Status, trips.Added, trips.Duplicates));
        Assert.Equal(3L, db.Scalar("SELECT COUNT(*) FROM trip_tests"));
        Assert.Equal(4L, db.Scalar("SELECT source_line FROM trip_tests WHERE current_a = 40.9"));
        Assert.Equal(FileHash.Sha256(Path.Combine(temp.Path, "trips.csv")),
            db.Scalar("SELECT f.sha256 FROM trip_tests t JOIN source_files f ON f.id = t.source_file_id LIMIT 1"));
        Assert.Equal("Board 1, way 1", db.Scalar("SELECT location FROM devices WHERE asset_tag = 'T-01'"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void UnitSuffixes_AreConvertedToTheStoredUnits(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Records.Register));

        Import(store, temp.Write("trips.csv", """
            asset_tag,tested_at,stage,pole,current_ka,trip_time_ms,held_ms,start
            T-02,2024-03-18,as-found,1,0.2008,12.5,,cold
            """));
        Import(store, temp.Write("contact.csv", """
            asset_tag,tested_at,stage,pole,resistance_mohm,test_current_a
            T-02,2024-03-18,as-found,1,1.25,50
            """));
        Import(store, temp.Write("insulation.csv", """
            asset_tag,tested_at,stage,path,test_voltage_kv,resistance_gohm
            T-02,2024-03-18,as-found,1-E,0.5,2.5
            T-02,2024-03-18,as-found,1-1',0.5,>10
            """));

        // _ka: x1000 A; _ms: x0.001 s; contact _mohm is milli-ohm: x1000 uOhm; _gohm: x1000 MOhm; _kv: x1000 V.
        Assert.Equal(200.8, (double)db.Scalar("SELECT current_a FROM trip_tests")!, 9);
        Assert.Equal(0.0125, (double)db.Scalar("SELECT time_s FROM trip_tests")!, 12);
        Assert.Equal(1250.0, (double)db.Scalar("SELECT resistance_uohm FROM contact_tests")!, 9);
        Assert.Equal(500.0, (double)db.Scalar("SELECT test_voltage_v FROM insulation_tests WHERE path = '1-E'")!, 9);
        Assert.Equal(2500.0, (double)db.Scalar("SELECT resistance_mohm FROM insulation_tests WHERE path = '1-E'")!, 9);
        Assert.Equal(1L, db.Scalar("SELECT over_range FROM insulation_tests WHERE path = '1-1'''"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ImportingTheSameFileTwice_AddsNothing(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Records.Register));
        var path = temp.Write("trips.csv", Records.Trips);

        Import(store, path);
        var again = Import(store, path);

        Assert.Equal(ImportStatus.AlreadyImported, again.Status);
        Assert.Equal(0L, again.Added);
        Assert.Equal(3L, db.Scalar("SELECT COUNT(*) FROM trip_tests"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TheSameRowsInAnotherFile_AreCountedAsDuplicates_NotStoredAgain(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Records.Register));
        Import(store, temp.Write("trips.csv", Records.Trips));

        var copy = Import(store, temp.Write("trips-copy.csv", Records.Trips + "\nT-01,2024-03-19T09:00,as-left,all,40.9,20.1,,cold,21,INJ-1,A. Tester,\n"));

        Assert.Equal((ImportStatus.Imported, 4L, 1L, 3L), (copy.Status, copy.RowsRead, copy.Added, copy.Duplicates));
        Assert.Equal(4L, db.Scalar("SELECT COUNT(*) FROM trip_tests"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AFileWithOneBadRow_IsRefusedWhole_AndTheProblemNamesTheLineAndColumn(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Records.Register));
        var path = temp.Write("trips.csv", Records.Trips + "\nT-01,2024-03-18T13:00,as-found,all,abc,0.01,,cold,21,INJ-1,A. Tester,\n");

        var outcome = Import(store, path);

        Assert.Equal(ImportStatus.Refused, outcome.Status);
        var problem = Assert.Single(outcome.Problems);
        Assert.Equal((path, 5L, "current_a"), (problem.File, problem.Line, problem.Column));
        Assert.Contains("'abc' is not a number", problem.Reason);
        Assert.Equal(0L, db.Scalar("SELECT COUNT(*) FROM trip_tests"));
        Assert.Equal(1L, db.Scalar("SELECT COUNT(*) FROM source_files"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ARowForADeviceNotInTheRegister_RefusesTheFile(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Records.Register));

        var outcome = Import(store, temp.Write("trips.csv", Records.Trips.Replace("T-01,2024-03-18T12:00", "T-99,2024-03-18T12:00")));

        Assert.Equal(ImportStatus.Refused, outcome.Status);
        var problem = Assert.Single(outcome.Problems);
        Assert.Equal((4L, "asset_tag"), (problem.Line, problem.Column));
        Assert.Contains("T-99", problem.Reason);
        Assert.Equal(0L, db.Scalar("SELECT COUNT(*) FROM trip_tests"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ReimportingAChangedRegister_UpdatesTheDevice_AndKeepsTheEarlierEntry(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register-2023.csv", Records.Register));

        var outcome = Import(store, temp.Write("register-2024.csv", Records.Register.Replace("Test Site,Board 1 way 2", "Test Site,Board 3 way 9")));

        Assert.Equal((0L, 1L, 1L), (outcome.Added, outcome.Updated, outcome.Unchanged));
        Assert.Equal("Board 3 way 9", db.Scalar("SELECT location FROM devices WHERE asset_tag = 'T-02'"));
        Assert.Equal(2, store.RevisionCount(AssetTag.Of("T-02")));
        Assert.Equal(1, store.RevisionCount(AssetTag.Of("T-01")));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TwoDifferentRegisterRowsForOneTag_RefuseTheFile(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();

        var outcome = Import(store, temp.Write("register.csv", Records.Register + "\nT-01,Test Site,Elsewhere,iec60898,C,16,1,230,,,,,\n"));

        Assert.Equal(ImportStatus.Refused, outcome.Status);
        Assert.Contains(outcome.Problems, p => p.Line == 4 && p.Reason.Contains("line 2", StringComparison.Ordinal));
        Assert.Equal(0L, db.Scalar("SELECT COUNT(*) FROM devices"));
    }

    [Fact]
    public void OpeningADatabase_AppliesTheMigrations_AndReopeningChangesNothing()
    {
        using var temp = new TempFolder();
        IReadOnlyList<string> first;
        using (var store = RecordStore.Open(temp.Database))
        {
            first = store.AppliedMigrations();
            Import(store, temp.Write("register.csv", Records.Register));
        }

        using var reopened = RecordStore.Open(temp.Database);

        Assert.Contains(first, m => m.EndsWith("_InitialSchema", StringComparison.Ordinal));
        Assert.Equal(first, reopened.AppliedMigrations());
        Assert.Equal(2, reopened.RegisterEntries().Count);
        Assert.Equal("wal", Scalar(temp.Database, "PRAGMA journal_mode"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AStoredTrip_ReadsBackAsTheSameMeasurement(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Records.Register));
        var parsed = RecordFileReader.Read(temp.Write("trips.csv", Records.Trips), Records.Today);
        store.Import(parsed, Now);

        var stored = store.Trips();

        Assert.Equal(parsed.Trips.Select(t => t.Record), stored.Select(s => s.Measurement));
        Assert.Equal(RecordKind.TripTests, parsed.Kind);
    }
}
