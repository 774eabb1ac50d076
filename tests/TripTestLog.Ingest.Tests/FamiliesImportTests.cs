using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Settings;
using TripTestLog.Storage;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>Registers with every device family, settings histories, curve and ambient tables, on real files and databases.</summary>
public sealed class FamiliesImportTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    private const string Register = """
        asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,settings_from,ir_a,tr_s,isd_a,tsd_s,tsd_i2t,ii_a,im_a,pickup_a,tms,highset_a,highset_delay_s,opening_time_s,curve_table,ambient_table
        E-1,S,L,iec60947-electronic,,630,3,400,,400,10,2400,0.2,no,4800,,,,,,,,
        E-1,S,L,iec60947-electronic,,630,3,400,2023-02-01,500,10,3000,0.2,yes,6000,,,,,,,,
        T-1,S,L,iec60947-thermal-magnetic,,160,3,400,,125,,,,,,1250,,,,,,TM-CURVE,TM-AMB
        R-1,S,L,relay-idmt,ieee-very-inverse,1250,3,400,,,,,,,,,600,2,6000,0.05,0.05,,
        C-1,S,L,curve-table,,32,1,230,,,,,,,,,,,,,,SPECIAL,
        M-1,S,L,iec60898,C,16,1,230,,,,,,,,,,,,,,,
        """;

    private static ImportOutcome Import(IRecordStore store, string path) => store.Import(RecordFileReader.Read(path, Records.Today), Now);

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void EveryFamily_IsRegisteredWithItsSettings_AndHistory(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();

        var outcome = Import(store, temp.Write("register.csv", Register));
        var histories = store.Histories();

        // Into an empty database every entry is new, the electronic unit's later settings too: nothing is "updated".
        Assert.Equal((ImportStatus.Imported, 6L, 0L), (outcome.Status, outcome.Added, outcome.Updated));
        Assert.Equal(6, Assert.Single(store.Verify().Files).Records); // verify counts the file's records as import does
        var electronic = histories["E-1"];
        Assert.Equal(2, electronic.Entries.Count);
        var later = Assert.IsType<ElectronicTripSettings>(electronic.InForceOn(new DateOnly(2024, 1, 1)).Settings);
        Assert.Equal((500.0, true, 6000.0), (later.Ir.Value, later.TsdI2t, later.Ii!.Value.Value));
        Assert.Equal(0.20, later.TimeTolerance.Fraction, 9);
        var tm = histories["T-1"].Latest;
        Assert.Equal(("TM-CURVE", "TM-AMB"), (tm.CurveTable, tm.AmbientTable));
        var relay = Assert.IsType<RelaySettings>(histories["R-1"].Latest.Settings);
        Assert.Equal((IdmtCurve.IeeeVeryInverse, 600.0, 2.0, 0.05), (relay.Curve, relay.Pickup.Value, relay.Tms, relay.OpeningTime.Value));
        Assert.Equal("SPECIAL", Assert.IsType<CurveTableSettings>(histories["C-1"].Latest.Settings).Table);
        Assert.Equal(TripCurve.C, Assert.IsType<Iec60898Settings>(histories["M-1"].Latest.Settings).Curve);

        // One device's entries alone, its tag matched as the register matches tags (any case), both entries kept.
        var one = store.Histories(AssetTag.Of("e-1"));
        Assert.Equal("E-1", Assert.Single(one).Key);
        Assert.Equal(2, one["E-1"].Entries.Count);
        Assert.Empty(store.Histories(AssetTag.Of("NOT-THERE")));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void ReimportingTheSameRegisterContent_AddsNoRevision(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Register));

        var again = Import(store, temp.Write("register-copy.csv", Register + "\n"));

        Assert.Equal((0L, 0L, 6L), (again.Added, again.Updated, again.Unchanged));
        Assert.Equal(2, store.RevisionCount(AssetTag.Of("E-1")));
    }

    [Theory]
    [InlineData("E-2,S,L,iec60947-electronic,,630,3,400,,,10,,,,,,,,,,,,", "ir_a", "long-time pickup Ir is required")]
    [InlineData("E-2,S,L,iec60947-electronic,,630,3,400,,700,10,,,,,,,,,,,,", "ir_a", "must not exceed the rated current")]
    [InlineData("E-2,S,L,iec60947-electronic,,630,3,400,,400,10,2400,,,,,,,,,,,", "tsd_s", "together")]
    [InlineData("T-2,S,L,iec60947-thermal-magnetic,,160,3,400,,125,,,,,,100,,,,,,,", "im_a", "must be above Ir")]
    [InlineData("R-2,S,L,relay-idmt,inverse-ish,1250,3,400,,,,,,,,,600,2,,,,,", "curve", "not a relay curve")]
    [InlineData("R-2,S,L,relay-idmt,standard-inverse,1250,3,400,,,,,,,,,600,,,,,,", "tms", "a value is required")]
    [InlineData("C-2,S,L,curve-table,,32,1,230,,,,,,,,,,,,,,,", "curve_table", "curve table")]
    [InlineData("X-1,S,L,iec60947,,32,1,230,,,,,,,,,,,,,,,", "family", "not a known device family")]
    public void MissingOrBadSettings_AreReportedByColumn(string row, string column, string phrase)
    {
        using var temp = new TempFolder();
        var header = Register.ReplaceLineEndings("\n").Split('\n')[0];

        var parsed = RecordFileReader.Read(temp.Write("bad.csv", header + "\n" + row + "\n"), Records.Today);

        Assert.Contains(parsed.Problems, p => p.Column == column && p.Reason.Contains(phrase, StringComparison.Ordinal) && p.Line == 2);
        Assert.Empty(parsed.Devices);
    }

    private const string MiniatureFamilies = """
        asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,supply,ir_a,tr_s,thermal_memory
        D-1,S,L,iec60898,C,16,2,230,dc,,,
        Q-1,S,L,iec61009,B,20,2,230,,,,
        E-3,S,L,iec60947-electronic,,630,3,400,,400,10,yes
        """;

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void DcBreakers_Rcbos_AndThermalMemory_AreRegistered_AndStoredAsRead(Provider provider)
    {
        // IEC 60898-2 (d.c.), IEC 61009-1 (RCBO) and an electronic unit with a thermal image, read back from the database.
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();

        var outcome = Import(store, temp.Write("register.csv", MiniatureFamilies));
        var again = Import(store, temp.Write("register-again.csv", MiniatureFamilies + "\n"));
        var histories = store.Histories();

        Assert.Equal((ImportStatus.Imported, 3L), (outcome.Status, outcome.Added));
        Assert.Equal((0L, 3L), (again.Updated, again.Unchanged));
        Assert.Equal(Supply.Dc, Assert.IsType<Iec60898Settings>(histories["D-1"].Latest.Settings).Supply);
        Assert.Equal((DeviceFamily.Iec61009, Supply.Ac), (histories["Q-1"].Latest.Family, ((Iec60898Settings)histories["Q-1"].Latest.Settings).Supply));
        Assert.True(Assert.IsType<ElectronicTripSettings>(histories["E-3"].Latest.Settings).ThermalMemory);
    }

    [Theory]
    [InlineData("D-2,S,L,iec60898,D,16,2,230,dc,,,", "curve", "only curves B and C")]
    [InlineData("D-2,S,L,iec60898,C,16,2,230,hvdc,,,", "supply", "write ac or dc")]
    [InlineData("Q-2,S,L,iec61009,C,16,2,230,dc,,,", "supply", "ac only")]
    [InlineData("E-4,S,L,iec60947-electronic,,630,3,400,,400,10,maybe", "thermal_memory", "not yes or no")]
    public void BadSupplyOrThermalMemory_IsReportedByColumn(string row, string column, string phrase)
    {
        using var temp = new TempFolder();
        var header = MiniatureFamilies.ReplaceLineEndings("\n").Split('\n')[0];

        var parsed = RecordFileReader.Read(temp.Write("bad.csv", header + "\n" + row + "\n"), Records.Today);

        Assert.Contains(parsed.Problems, p => p.Column == column && p.Reason.Contains(phrase, StringComparison.Ordinal) && p.Line == 2);
        Assert.Empty(parsed.Devices);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void TwoEntriesForOneDeviceWithTheSameDate_RefuseTheFile(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();

        var outcome = Import(store, temp.Write("register.csv", Register + "\nE-1,S,L,iec60947-electronic,,630,3,400,2023-02-01,450,10,3000,0.2,yes,6000,,,,,,,,\n"));

        Assert.Equal(ImportStatus.Refused, outcome.Status);
        Assert.Contains(outcome.Problems, p => p.Line == 8 && p.Reason.Contains("same settings_from", StringComparison.Ordinal));
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void CurveAndAmbientTables_AreStored_AndTheNewestFileDefinesATable(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();

        Import(store, temp.Write("curves-1.csv", "table,multiple,min_s,max_s\nSPECIAL,1.5,60,3600\nSPECIAL,3,4,120\n"));
        Import(store, temp.Write("curves-2.csv", "table,multiple,min_s,max_s\nSPECIAL,1.5,50,3000\nSPECIAL,3,4,120\nSPECIAL,10,0,0.1\n"));
        Import(store, temp.Write("ambient.csv", "table,ambient_c,current_factor\nTM-AMB,20,1.08\nTM-AMB,40,1.0\n"));

        var table = store.CurveTables()["SPECIAL"];
        Assert.Equal(3, table.Points.Count);
        Assert.Equal(50, table.Points[0].Minimum.Value);
        Assert.Equal(1.04, store.AmbientTables()["TM-AMB"].FactorAt(Domain.Quantities.Celsius.Of(30))!.Value, 9);
    }

    [Fact]
    public void ACurveTableThatBreaksItsRules_IsRefusedWithTheLine()
    {
        using var temp = new TempFolder();

        var parsed = RecordFileReader.Read(temp.Write("curves.csv", "table,multiple,min_s,max_s\nSPECIAL,1.5,60,3600\nSPECIAL,3,90,120\n"), Records.Today);

        var problem = Assert.Single(parsed.Problems);
        Assert.Equal(3, problem.Line);
        Assert.Contains("minimum time must not rise", problem.Reason);
    }

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void SettingsFoundOnATripRecord_AreStoredAndReadBack(Provider provider)
    {
        using var temp = new TempFolder();
        using var db = TestDatabase.Create(provider, temp.Path);
        using var store = db.Open();
        Import(store, temp.Write("register.csv", Register));

        Import(store, temp.Write("trips.csv", "asset_tag,tested_at,stage,pole,current_a,trip_time_s,start,ir_a\nE-1,2025-03-10,as-found,all,1500,28.1,cold,420\n"));

        var found = Assert.Single(store.Trips()).Measurement.FoundSettings;
        Assert.Equal(420, found!.Ir!.Value.Value);
        Assert.Null(found.Tms);
    }
}
