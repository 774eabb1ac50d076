using TripTestLog.Storage;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage.Postgres;

/// <summary>The streaming read on the server: the same ordered queries as on SQLite, merged by asset tag, one device at a time.</summary>
public sealed partial class PostgresRecordStore : ITripSource
{
    private static readonly string OnlyTag = $"WHERE @tag IS NULL OR {ServerSql.TagKey("d.asset_tag")} = {ServerSql.TagKey("@tag")}";

    private static readonly string TripsInDeviceOrder = Trips(OnlyTag);

    // The trip query for the devices <paramref name="filter"/> (a WHERE clause) picks, by device and then test time.
    private static string Trips(string filter) =>
        $"SELECT {StoredColumns.Trips}, {TestTime("t")} FROM devices d JOIN trip_tests t ON t.device_id = d.id {filter} "
        + "ORDER BY d.asset_tag, t.tested_at, t.source_file_id, t.source_line";

    private static readonly string ContactsInDeviceOrder =
        $"SELECT {StoredColumns.Contacts}, {TestTime("c")} FROM devices d JOIN contact_tests c ON c.device_id = d.id {OnlyTag} "
        + "ORDER BY d.asset_tag, c.tested_at, c.source_file_id, c.source_line";

    private static readonly string InsulationInDeviceOrder =
        $"SELECT {StoredColumns.Insulation}, {TestTime("i")} FROM devices d JOIN insulation_tests i ON i.device_id = d.id {OnlyTag} "
        + "ORDER BY d.asset_tag, i.tested_at, i.source_file_id, i.source_line";

    // The devices sharing a family and a rated current with some register entry of the device tagged @tag.
    private static readonly string PeerDevices =
        "WHERE d.id IN (SELECT p.device_id FROM devices o JOIN device_revisions r ON r.device_id = o.id "
        + $"JOIN device_revisions p ON p.family = r.family AND p.rated_current_a = r.rated_current_a WHERE {ServerSql.TagKey("o.asset_tag")} = {ServerSql.TagKey("@tag")})";

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> PeersOf(AssetTag tag)
    {
        using var snapshot = new ReadSnapshot(this);
        using var revisions = snapshot.Query(
            $"SELECT d.asset_tag, {ServerSql.RegisterSelect("r")} FROM device_revisions r JOIN devices d ON d.id = r.device_id {PeerDevices} ORDER BY d.asset_tag, r.id", tag);
        var rows = new StoredRows(SourceFileNames(revisions.Connection!), r => ServerRows.TestedAt(r, 1, r.FieldCount - 2));
        using var entries = revisions.ExecuteReader();
        using var trips = new TagStream<StoredTrip>(snapshot.Query(Trips(PeerDevices), tag), rows.Trip);
        foreach (var device in DeviceWalk.Merge(entries, trips, null, null))
        {
            yield return device;
        }
    }

    /// <inheritdoc />
    public IEnumerable<DeviceRecords> Devices(AssetTag? only = null, bool withResistance = false)
    {
        using var snapshot = new ReadSnapshot(this);
        using var revisions = snapshot.Query(
            $"SELECT d.asset_tag, {ServerSql.RegisterSelect("r")} FROM device_revisions r JOIN devices d ON d.id = r.device_id {OnlyTag} ORDER BY d.asset_tag, r.id", only);
        var files = SourceFileNames(revisions.Connection!);

        // Every stream ends with the test time's offset and has-time columns.
        var rows = new StoredRows(files, r => ServerRows.TestedAt(r, 1, r.FieldCount - 2));
        using var entries = revisions.ExecuteReader();
        using var trips = new TagStream<StoredTrip>(snapshot.Query(TripsInDeviceOrder, only), rows.Trip);
        using var contacts = withResistance ? new TagStream<StoredMeasurement<ContactMeasurement>>(snapshot.Query(ContactsInDeviceOrder, only), rows.Contact) : null;
        using var insulation = withResistance ? new TagStream<StoredMeasurement<InsulationMeasurement>>(snapshot.Query(InsulationInDeviceOrder, only), rows.Insulation) : null;
        foreach (var device in DeviceWalk.Merge(entries, trips, contacts, insulation))
        {
            yield return device;
        }
    }

    /// <inheritdoc />
    public IReadOnlyDictionary<string, CurveTable> CurveTables() => StoredTables.Curves(Rows(
        "SELECT table_name, multiple, min_s, max_s, source_file_id, source_line FROM curve_table_rows",
        r => new CurveTableRowEntity
        {
            TableName = r.GetString(0), Multiple = r.GetDouble(1), MinS = r.GetDouble(2), MaxS = r.IsDBNull(3) ? null : r.GetDouble(3),
            SourceFileId = r.GetInt64(4), SourceLine = r.GetInt64(5),
        }));

    /// <inheritdoc />
    public IReadOnlyDictionary<string, AmbientTable> AmbientTables() => StoredTables.Ambients(Rows(
        "SELECT table_name, ambient_c, current_factor, source_file_id, source_line FROM ambient_table_rows",
        r => new AmbientTableRowEntity
        {
            TableName = r.GetString(0), AmbientC = r.GetDouble(1), CurrentFactor = r.GetDouble(2), SourceFileId = r.GetInt64(3), SourceLine = r.GetInt64(4),
        }));

    /// <inheritdoc />
    public InstrumentRegister Instruments() => new(Rows(
        $"SELECT instrument, kind, serial, calibrated_on, calibration_due, {InstrumentAccuracyColumns.List} FROM instruments ORDER BY id",
        r => new InstrumentCalibration(r.GetString(0), r.GetString(1), r.GetString(2), r.GetFieldValue<DateOnly>(3), r.GetFieldValue<DateOnly>(4))
        {
            Accuracy = InstrumentAccuracyColumns.Read(r, 5),
        }));

    // The test time's offset and has-time columns, which every measurement stream ends with.
    private static string TestTime(string alias) => $"{alias}.{ServerColumnTypes.OffsetColumn}, {alias}.{ServerColumnTypes.HasTimeColumn}";

    private static Dictionary<long, string> SourceFileNames(Npgsql.NpgsqlConnection connection)
    {
        using var select = new Npgsql.NpgsqlCommand("SELECT id, file_name FROM source_files", connection);
        using var reader = select.ExecuteReader();
        var names = new Dictionary<long, string>();
        while (reader.Read())
        {
            names[reader.GetInt64(0)] = reader.GetString(1);
        }

        return names;
    }

    private List<T> Rows<T>(string sql, Func<System.Data.Common.DbDataReader, T> read)
    {
        using var select = Command(sql);
        using var reader = select.ExecuteReader();
        var list = new List<T>();
        while (reader.Read())
        {
            list.Add(read(reader));
        }

        return list;
    }
}
