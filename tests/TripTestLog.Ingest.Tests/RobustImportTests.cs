using TripTestLog.Application.Stores;
using TripTestLog.Domain.Devices;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using Microsoft.Data.Sqlite;
using TripTestLog.Application.Records;
using TripTestLog.Storage;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>Nothing lost, nothing silently changed: accept-valid with rejects, corrections, instruments, verify and backup.</summary>
public sealed class RobustImportTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    private const string Trips = """
        asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,instrument
        T-01,2024-03-18T09:00,as-found,all,18.2,,3600,cold,INJ-1
        T-01,2024-03-18T10:00,as-found,all,abc,1500,,warm,INJ-1
        T-99,2024-03-18T11:00,as-found,all,40.9,22.5,,cold,INJ-1
        T-01,2024-03-18T12:00,as-found,all,40.9,22.5,,cold,INJ-1
        T-01,2024-03-18T12:00,as-found,all,40.9,22.5,,cold,INJ-1
        "T-01","2024-03-18T13:00",as-found,all,80.1,0.02,,cold,"INJ-1"
        """;

    private static (IRecordStore Store, TestDatabase Db) Open(TempFolder temp, TestDatabase database)
    {
        var store = database.Open();
        store.Import(RecordFileReader.Read(temp.Write("register.csv", Records.Register), Records.Today), Now);
        return (store, database);
    }

    private static (IRecordStore Store, string Db) Open(TempFolder temp)
    {
        var store = RecordStore.Open(temp.Database);
        store.Import(RecordFileReader.Read(temp.Write("register.csv", Records.Register), Records.Today), Now);
        return (store, temp.Database);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AcceptValid_StoresTheGoodRows_AccountsForEveryRow_AndWritesTheRefusedOnesUnchanged(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var _ = store;
        var path = temp.Write("mixed.csv", Trips);
        var parsed = RecordFileReader.Read(path, Records.Today);

        var outcome = store.Import(parsed, Now, new ImportOptions(AcceptValid: true));
        var rejects = outcome.RejectsFile;

        // Six rows: three stored, one duplicate of an earlier row, two refused (a bad number, an unknown tag).
        Assert.Equal((ImportStatus.Imported, 6L, 3L, 1L, 2L), (outcome.Status, outcome.RowsRead, outcome.Added, outcome.Duplicates, outcome.RefusedRows));
        Assert.Equal(outcome.RowsRead, outcome.Added + outcome.Duplicates + outcome.RefusedRows);
        Assert.Equal(3, db.Count("SELECT COUNT(*) FROM trip_tests"));
        var lines = File.ReadAllLines(rejects!);
        Assert.Equal("asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,instrument,reject_reasons", lines[0]);
        Assert.StartsWith("T-01,2024-03-18T10:00,as-found,all,abc,1500,,warm,INJ-1,\"current_a: 'abc' is not a number", lines[1]);
        Assert.StartsWith("T-99,2024-03-18T11:00,as-found,all,40.9,22.5,,cold,INJ-1,\"asset_tag: asset tag 'T-99'", lines[2]);
        Assert.Equal(3, lines.Length);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ARejectsFile_OnceFixed_ImportsAsItIs(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var _ = store;
        var path = temp.Write("mixed.csv", Trips);
        var outcome = store.Import(RecordFileReader.Read(path, Records.Today), Now, new ImportOptions(AcceptValid: true));
        var rejects = outcome.RejectsFile!;
        File.WriteAllText(rejects, File.ReadAllText(rejects).Replace(",abc,", ",23.3,").Replace("T-99,", "T-02,"));

        var fixedUp = store.Import(RecordFileReader.Read(rejects, Records.Today), Now);

        Assert.Equal((ImportStatus.Imported, 2L), (fixedUp.Status, fixedUp.Added));
        Assert.Equal(5, db.Count("SELECT COUNT(*) FROM trip_tests"));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ACorrectedFile_IsANewFile_UntilReplaceNamesTheFileItCorrects_KeepingTheOldValue(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var _ = store;
        var path = temp.Write("trips.csv", Records.Trips);
        store.Import(RecordFileReader.Read(path, Records.Today), Now);
        File.WriteAllText(path, Records.Trips.ReplaceLineEndings("\n").Replace("40.9,22.5", "40.9,25.0"));

        var replaced = store.Import(RecordFileReader.Read(path, Records.Today), Now, new ImportOptions(Corrects: "trips.csv"));

        Assert.Equal((ImportStatus.Imported, 1L, 0L, 2L, 0L), (replaced.Status, replaced.Replaced, replaced.Added, replaced.Unchanged, replaced.Duplicates));
        Assert.Equal(3, db.Count("SELECT COUNT(*) FROM trip_tests"));
        Assert.Equal(1, db.Count("SELECT COUNT(*) FROM trip_tests WHERE time_s = 25.0"));
        var audit = Assert.Single(store.Changes());
        Assert.Equal(("trip_tests", "time_s", "22.5", "25"), (audit.Table, audit.Column, audit.Old, audit.New));

        // A correction applied through the tool is no fault: the first import's file now holds the second's content.
        var verified = store.Verify();
        Assert.True(verified.Sound);
        Assert.Equal([SourceFileState.Matches, SourceFileState.Superseded, SourceFileState.Matches], verified.Files.Select(f => f.State)); // register, trips, trips corrected
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ACopyUnderAnotherName_IsAlreadyImported_AndNamesTheFileItRepeats(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, _) = Open(temp, database);
        using var s = store;
        var first = temp.Write("trips.csv", Records.Trips);
        store.Import(RecordFileReader.Read(first, Records.Today), Now);

        var copy = store.Import(RecordFileReader.Read(temp.Write("trips-copy.csv", Records.Trips), Records.Today), Now);

        Assert.Equal(ImportStatus.AlreadyImported, copy.Status);
        Assert.Equal(first, copy.EarlierFile);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ATagWrittenInOtherCase_IsTheSameDevice_InRecordsAndInTheRegister(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var s = store;

        var trips = store.Import(RecordFileReader.Read(temp.Write("trips.csv", Records.Trips.Replace("T-01,", "t-01,", StringComparison.Ordinal)), Records.Today), Now);
        var register = store.Import(RecordFileReader.Read(temp.Write("register-lower.csv", Records.Register.Replace("T-02,", "t-02,", StringComparison.Ordinal) + "\n"), Records.Today), Now);

        Assert.Equal((ImportStatus.Imported, 0L), (trips.Status, trips.RefusedRows));
        Assert.Equal((0L, 0L), (register.Added, register.Updated)); // the same entries, in other case: unchanged
        Assert.Equal(2, db.Count("SELECT COUNT(*) FROM devices"));
        Assert.Equal("T-01", store.Trips(AssetTag.Of("t-01"))[0].Tag.Value);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ATagWrittenSpreadsheetSafe_ReadsAsTheTagItself(Provider provider)
    {
        // A CSV this tool writes puts an apostrophe before a tag that starts like a formula, so a spreadsheet shows it as
        // text (OWASP, "CSV Injection"); importing that file again must find the device.
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, db) = Open(temp, database);
        using var s = store;
        store.Import(RecordFileReader.Read(temp.Write("register-2.csv", Records.Register.Replace("T-01,", "=T-01,", StringComparison.Ordinal) + "\n"), Records.Today), Now);

        var trips = store.Import(RecordFileReader.Read(temp.Write("trips.csv", Records.Trips.Replace("T-01,", "'=T-01,", StringComparison.Ordinal)), Records.Today), Now);

        Assert.Equal((ImportStatus.Imported, 0L), (trips.Status, trips.RefusedRows));
        Assert.Equal(db.Count("SELECT COUNT(*) FROM trip_tests"), store.Trips(AssetTag.Of("=T-01")).Count);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TheSameFileUnderAnotherPath_IsNotACorrection(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, _) = Open(temp, database);
        using var s = store;
        store.Import(RecordFileReader.Read(temp.Write("trips.csv", Records.Trips), Records.Today), Now);
        Directory.CreateDirectory(Path.Combine(temp.Path, "copy"));

        var other = store.Import(RecordFileReader.Read(temp.Write("copy/trips.csv", Records.Trips.ReplaceLineEndings("\n").Replace("40.9,22.5", "40.9,25.0")), Records.Today), Now);

        Assert.Equal((ImportStatus.Imported, 1L, 2L), (other.Status, other.Added, other.Duplicates));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AnInstrumentRegister_IsStored_AndLapsedCalibrationsAreFound(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        var (store, _) = Open(temp, database);
        using var s = store;

        var outcome = store.Import(RecordFileReader.Read(temp.Write("instruments.csv", """
            instrument,kind,serial,calibrated_on,calibration_due
            INJ-1,primary injection set,PI-0042,2023-01-10,2024-01-09
            INJ-1,primary injection set,PI-0042,2024-06-01,2025-05-31
            OHM-1,micro-ohm meter,MO-7,2024-01-01,2027-01-01
            """), Records.Today), Now);
        var register = store.Instruments();

        Assert.Equal((ImportStatus.Imported, 3L), (outcome.Status, outcome.Added));
        Assert.Null(register.Check("INJ-1", new DateOnly(2023, 6, 1), requireRegistered: true));
        Assert.Contains("lapsed on 2024-01-09", register.Check("INJ-1", new DateOnly(2024, 3, 18), requireRegistered: false));
        Assert.Null(register.Check("SET-X", new DateOnly(2024, 3, 18), requireRegistered: false));
        Assert.Contains("not in the instrument register", register.Check("SET-X", new DateOnly(2024, 3, 18), requireRegistered: true));
    }

    [Fact]
    public void Verify_FindsAFileChangedSinceImport_AndBackupCopiesEverything()
    {
        using var temp = new TempFolder();
        var (store, _) = Open(temp);
        using var s = store;
        var path = temp.Write("trips.csv", Records.Trips);
        store.Import(RecordFileReader.Read(path, Records.Today), Now);

        var before = store.Verify();
        File.AppendAllText(path, "T-01,2024-03-19,as-left,all,40.9,20,,cold,,,,\n");
        var after = store.Verify();
        var copy = Path.Combine(temp.Path, "backup.db");
        store.Backup(copy);

        Assert.True(before.Sound);
        Assert.All(before.Files, f => Assert.Equal(SourceFileState.Matches, f.State));
        Assert.False(after.Sound);
        Assert.Equal(SourceFileState.Changed, after.Files.Single(f => f.Path.EndsWith("trips.csv", StringComparison.Ordinal)).State);
        using var restored = RecordStore.Open(copy);
        Assert.Equal(store.Counts(), restored.Counts());
    }

    [Fact]
    public void ProfilesReadOtherLayouts()
    {
        using var temp = new TempFolder();
        var profile = temp.Write("panel.profile.json", """
            {
              "profile": "Panel set export",
              "files": ["panel-*.csv"],
              "delimiter": ";",
              "decimal": ",",
              "date_format": "dd.MM.yyyy HH:mm",
              "columns": { "Tag": "asset_tag", "Date": "tested_at", "I [A]": "current_a", "t [ms]": "trip_time_ms", "Cold": "start" },
              "ignore": ["Operator note"],
              "constants": { "stage": "as-found", "pole": "all", "instrument": "PANEL-7" }
            }
            """);
        var file = temp.Write("panel-0318.csv", "Tag;Date;I [A];t [ms];Cold;Operator note\nT-01;18.03.2024 09:30;40,8;22500;cold;fine\n");
        var (loaded, problem) = ColumnProfile.Load(profile);

        var parsed = RecordFileReader.Read(file, Records.Today, new ReadOptions { Profile = loaded });

        Assert.Null(problem);
        Assert.True(loaded!.AppliesTo("panel-0318.csv"));
        Assert.Empty(parsed.Problems);
        var trip = parsed.Trips[0].Record;
        Assert.Equal(("2024-03-18T09:30:00", 40.8, 22.5, "PANEL-7"), (trip.TestedAt.ToString(), trip.Current.Value, trip.Outcome.Time.Value, trip.Instrument));
    }

    [Fact]
    public void ABrokenProfile_IsReportedWithItsLine()
    {
        using var temp = new TempFolder();

        var (profile, problem) = ColumnProfile.Load(temp.Write("bad.profile.json", "{\n  \"profile\": \"x\",\n  \"columns\": { \"a\" \"b\" }\n}\n"));

        Assert.Null(profile);
        Assert.Contains("bad.profile.json:3", problem);
    }
}
