using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Ingest.Tests;

/// <summary>`verify` recomputes every stored measurement's fingerprint: a value changed outside the tool is found. Project design, no outside source.</summary>
public sealed class VerifyFingerprintTests
{
    private static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    [Theory]
    [MemberData(nameof(TestDatabase.Providers), MemberType = typeof(TestDatabase))]
    public void AValueChangedInSql_IsReportedRecordByRecord_InEachMeasurementTable(Provider provider)
    {
        using var temp = new TempFolder();
        using var database = TestDatabase.Create(provider, temp.Path);
        using var store = database.Open();
        store.Import(temp.Write("register.csv", Records.Register), Now);
        store.Import(temp.Write("trips.csv", Records.Trips), Now);
        store.Import(temp.Write("contact.csv", "asset_tag,tested_at,stage,pole,resistance_uohm,test_current_a\nT-02,2024-03-18T09:30+02:00,as-found,1,1250,100\n"), Now);
        store.Import(temp.Write("ir.csv", "asset_tag,tested_at,stage,path,test_voltage_v,resistance_mohm\nT-01,2024-03-18,as-found,1-E,500,250\n"), Now);
        var before = store.Verify();

        database.Scalar("UPDATE trip_tests SET time_s = time_s/100");
        var trips = store.Verify();
        database.Scalar("UPDATE contact_tests SET resistance_uohm = 125");
        database.Scalar("UPDATE insulation_tests SET resistance_mohm = 2500");
        var all = store.Verify();

        Assert.True(before.Sound);
        Assert.Equal(0, before.AlteredRecords);
        Assert.False(trips.Sound);
        Assert.Equal(3, trips.AlteredRecords); // every trip row: a held row's time is 3600 s held
        Assert.Contains(trips.AlteredExamples, e => e.StartsWith("trip_tests: ", StringComparison.Ordinal) && e.EndsWith("trips.csv line 4", StringComparison.Ordinal));
        Assert.Equal(5, all.AlteredRecords);
        Assert.Contains(all.AlteredExamples, e => e.StartsWith("contact_tests: ", StringComparison.Ordinal));
        Assert.Contains(all.AlteredExamples, e => e.StartsWith("insulation_tests: ", StringComparison.Ordinal));
    }
}
