using System.Globalization;
using TripTestLog.Application.Check;
using TripTestLog.Application.Stores;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage;

/// <summary>
/// The streaming read: ordered queries (register revisions, then each kind of measurement) merged by asset tag, so
/// one device is held at a time. Every query runs in one read scope, so an import that commits meanwhile is seen by
/// none of them or by all (a record never names a file not read). DEVELOPERS.md shows the trip query's plan.
/// </summary>
public abstract partial class RelationalStore : ITripSource
{
    /// <summary>The trip query the check reader runs in <paramref name="dialect"/>, by device and then test time, for every device or the one "tag" names.</summary>
    protected static string TripsInDeviceOrderOf(StoreDialect dialect)
    {
        ArgumentNullException.ThrowIfNull(dialect);
        return MeasurementsOf(dialect, MeasurementTable.Trips, dialect.AnyOrTag("d.asset_tag"));
    }

    // The register revisions of the devices a condition picks, by device.
    private string RevisionsOf(string filter) =>
        $"SELECT d.asset_tag, {Dialect.RegisterSelect("r")} FROM device_revisions r JOIN devices d ON d.id = r.device_id WHERE {filter} ORDER BY d.asset_tag, r.id";

    // A kind of measurement for the devices a condition picks, by device and then test time. With the dialect's device
    // join the devices are walked by their tag index and each device's records found by their device index, so only
    // one device's records are ever sorted.
    private static string MeasurementsOf(StoreDialect dialect, MeasurementTable table, string filter)
    {
        var a = table.Alias;
        return $"SELECT {table.Selected}{dialect.TestTimeColumns(a)} FROM devices d {dialect.DeviceJoin} {table.Table} {a} ON {a}.device_id = d.id WHERE {filter} "
            + $"ORDER BY d.asset_tag, {a}.tested_at, {a}.source_file_id, {a}.source_line";
    }

    /// <summary>The devices sharing a family and a rated current with some register entry of the device "tag" names.</summary>
    protected string PeerDevices =>
        "d.id IN (SELECT p.device_id FROM devices o JOIN device_revisions r ON r.device_id = o.id "
        + $"JOIN device_revisions p ON p.family = r.family AND p.rated_current_a = r.rated_current_a WHERE {Dialect.TagIs("o.asset_tag")})";

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> PeersOf(AssetTag tag)
    {
        ReadingMany();
        using var scope = BeginRead();
        using var revisions = scope.Query(RevisionsOf(PeerDevices), tag);
        var rows = new StoredRows(SourceFileNames(revisions.Connection!), r => Dialect.TestedAt(r, 1));
        using var entries = revisions.ExecuteReader();
        using var trips = new TagStream<StoredTrip>(scope.Query(MeasurementsOf(Dialect, MeasurementTable.Trips, PeerDevices), tag), rows.Trip);
        foreach (var device in DeviceWalk.Merge(entries, trips, null, null))
        {
            yield return device;
        }
    }

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false)
    {
        if (only is null)
        {
            ReadingMany();
        }

        using var scope = BeginRead();
        var any = Dialect.AnyOrTag("d.asset_tag");
        using var revisions = scope.Query(RevisionsOf(any), only);
        var rows = new StoredRows(SourceFileNames(revisions.Connection!), r => Dialect.TestedAt(r, 1));
        using var entries = revisions.ExecuteReader();
        using var trips = new TagStream<StoredTrip>(scope.Query(TripsInDeviceOrderOf(Dialect), only), rows.Trip);
        using var contacts = withResistance
            ? new TagStream<StoredMeasurement<ContactMeasurement>>(scope.Query(MeasurementsOf(Dialect, MeasurementTable.Contacts, any), only), rows.Contact)
            : null;
        using var insulation = withResistance
            ? new TagStream<StoredMeasurement<InsulationMeasurement>>(scope.Query(MeasurementsOf(Dialect, MeasurementTable.Insulations, any), only), rows.Insulation)
            : null;
        foreach (var device in DeviceWalk.Merge(entries, trips, contacts, insulation))
        {
            yield return device;
        }
    }

    /// <summary>Every device's register entries, oldest first, by asset tag; with <paramref name="only"/>, that device's alone.</summary>
    public IReadOnlyDictionary<string, DeviceHistory> Histories(AssetTag? only = null)
    {
        using var select = Command(RevisionsOf(Dialect.AnyOrTag("d.asset_tag")));
        Dialect.SetText(select, "tag", only?.Value);
        using var reader = select.ExecuteReader();
        return DeviceMapping.Histories(reader);
    }

    /// <summary>How many records of each kind the store holds.</summary>
    public StoreCounts Counts() => new(
        Scalar("SELECT COUNT(*) FROM source_files"),
        Scalar("SELECT COUNT(*) FROM devices"),
        Scalar("SELECT COUNT(*) FROM trip_tests"),
        Scalar("SELECT COUNT(*) FROM contact_tests"),
        Scalar("SELECT COUNT(*) FROM insulation_tests"));

    /// <summary>Every curve table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, CurveTable> CurveTables() => StoredTables.Curves(Rows(
        "SELECT table_name, multiple, min_s, max_s, source_file_id, source_line FROM curve_table_rows",
        r => new CurveTableRowEntity
        {
            TableName = r.GetString(0), Multiple = r.GetDouble(1), MinS = r.GetDouble(2), MaxS = r.IsDBNull(3) ? null : r.GetDouble(3),
            SourceFileId = r.GetInt64(4), SourceLine = r.GetInt64(5),
        }));

    /// <summary>Every ambient table, each as the newest imported file defines it.</summary>
    public IReadOnlyDictionary<string, AmbientTable> AmbientTables() => StoredTables.Ambients(Rows(
        "SELECT table_name, ambient_c, current_factor, source_file_id, source_line FROM ambient_table_rows",
        r => new AmbientTableRowEntity
        {
            TableName = r.GetString(0), AmbientC = r.GetDouble(1), CurrentFactor = r.GetDouble(2), SourceFileId = r.GetInt64(3), SourceLine = r.GetInt64(4),
        }));

    /// <summary>The instrument register: every calibration imported, in the order imported.</summary>
    public InstrumentRegister Instruments() => new(Rows(
        $"SELECT instrument, kind, serial, {Dialect.Text("calibrated_on")}, {Dialect.Text("calibration_due")}, {InstrumentAccuracyColumns.List} FROM instruments ORDER BY id",
        r => new InstrumentCalibration(r.GetString(0), r.GetString(1), r.GetString(2), Date(r.GetString(3)), Date(r.GetString(4)))
        {
            Accuracy = InstrumentAccuracyColumns.Read(r, 5),
        }));

    private static DateOnly Date(string text) => DateOnly.ParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture);
}
