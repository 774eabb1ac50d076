using TripTestLog.Application.Stores;
using TripTestLog.Ingest.Tests.Stores;
using TripTestLog.Application.Findings;
using TripTestLog.Application.Import;
using TripTestLog.Storage;

namespace TripTestLog.Ingest.Tests.Findings;

/// <summary>
/// A real database with records written as real CSV files and imported through the real pipeline, then judged by the
/// real findings pipeline. Rows are given without their header, in the documented record formats.
/// </summary>
internal sealed class FindingsStore : IDisposable
{
    public static readonly DateOnly AsOf = new(2026, 12, 1);
    public static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);
    private readonly TempFolder _temp = new();
    private readonly TestDatabase _database;
    private readonly IRecordStore _store;
    private int _files;

    public FindingsStore(Provider provider)
    {
        _database = TestDatabase.Create(provider, _temp.Path);
        _store = _database.Open();
    }

    public FindingsStore Register(params string[] rows) => Import(
        "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial", rows);

    public FindingsStore Trips(params string[] rows) => Import(
        "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note", rows);

    public FindingsStore Contacts(params string[] rows) => Import(
        "asset_tag,tested_at,stage,pole,resistance_uohm,test_current_a,temperature_c,instrument,technician", rows);

    public FindingsStore Insulation(params string[] rows) => Import(
        "asset_tag,tested_at,stage,path,test_voltage_v,resistance_mohm,temperature_c,duration_s", rows);

    /// <summary>Any record file, with its own header (a register with settings columns, say).</summary>
    public FindingsStore Records(string header, params string[] rows) => Import(header, rows);

    public FindingsStore Instruments(params string[] rows) => Import(
        "instrument,kind,serial,calibrated_on,calibration_due,time_accuracy_pct,time_accuracy_s,current_accuracy_pct,current_accuracy_a,"
        + "resistance_accuracy_pct,resistance_accuracy_uohm,insulation_accuracy_pct,coverage_factor", rows);

    public IReadOnlyList<DeviceCondition> Conditions(FindingPolicy? policy = null, DateOnly? asOf = null) =>
        [.. FindingsPipeline.Run(_store, policy ?? FindingPolicy.Default, asOf ?? AsOf)];

    public DeviceCondition Device(string tag, FindingPolicy? policy = null, DateOnly? asOf = null) =>
        Conditions(policy, asOf).Single(d => d.Device.Tag.Value == tag);

    private FindingsStore Import(string header, string[] rows)
    {
        var path = _temp.Write($"records-{++_files}.csv", header + "\n" + string.Join("\n", rows) + "\n");
        var outcome = _store.Import(path, Now);
        if (outcome.Status != ImportStatus.Imported)
        {
            throw new InvalidOperationException($"test records did not import: {string.Join("; ", outcome.Problems.Select(p => p.ToString()))}");
        }

        return this;
    }

    public void Dispose()
    {
        _store.Dispose();
        _database.Dispose();
        _temp.Dispose();
    }
}
