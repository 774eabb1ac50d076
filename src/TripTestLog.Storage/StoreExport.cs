using System.Data.Common;
using System.Globalization;
using TripTestLog.Application.Check;
using TripTestLog.Application.Records;
using TripTestLog.Application.Transfer;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Storage;

/// <summary>
/// The queries and readers of a store's export: one file's records by line, and the trail of corrections, written with
/// the store's <see cref="StoreDialect"/>.
/// </summary>
internal sealed class StoreExport(StoreDialect dialect)
{
    /// <summary>The records of one file, by line (then as stored), with the file's id as the parameter "id".</summary>
    public string RecordsSql(RecordKind kind) => kind switch
    {
        RecordKind.DeviceRegister =>
            $"SELECT d.asset_tag, {dialect.RegisterSelect("r")}, r.source_line FROM device_revisions r JOIN devices d ON d.id = r.device_id "
            + $"WHERE r.source_file_id = {Id} ORDER BY r.source_line, r.id",
        RecordKind.TripTests or RecordKind.ContactResistance or RecordKind.InsulationResistance => Measurements(MeasurementTable.For(kind)),
        RecordKind.CurveTable => $"SELECT table_name, multiple, min_s, max_s, source_line FROM curve_table_rows WHERE source_file_id = {Id} ORDER BY source_line, id",
        RecordKind.AmbientTable => $"SELECT table_name, ambient_c, current_factor, source_line FROM ambient_table_rows WHERE source_file_id = {Id} ORDER BY source_line, id",
        _ => $"SELECT instrument, kind, serial, {dialect.Text("calibrated_on")}, {dialect.Text("calibration_due")}, source_line, {InstrumentAccuracyColumns.List} "
            + $"FROM instruments WHERE source_file_id = {Id} ORDER BY source_line, id",
    };

    /// <summary>Every correction, oldest first: table, record fingerprint, column, old, new, old and new file hashes, time.</summary>
    public string ChangesSql => string.Join(" UNION ALL ", new[] { "trip_tests", "contact_tests", "insulation_tests" }.Select(table =>
            $"SELECT a.id, a.table_name, {dialect.Text("t.fingerprint")}, a.column_name, a.old_value, a.new_value, fo.sha256, fn.sha256, {dialect.Text("a.changed_at")} "
            + $"FROM audit_changes a JOIN {table} t ON a.table_name = '{table}' AND t.id = a.record_id "
            + "JOIN source_files fo ON fo.id = a.old_source_file_id JOIN source_files fn ON fn.id = a.new_source_file_id"))
        + " ORDER BY 1";

    /// <summary>Reads the rows of <see cref="RecordsSql"/> as records with their lines; the reader is walked lazily.</summary>
    public IEnumerable<Located<ReadRecord>> Records(DbDataReader r, StoredFile file)
    {
        var rows = new StoredRows(new Dictionary<long, string> { [file.Id] = file.Name }, r => dialect.TestedAt(r, 1));
        while (r.Read())
        {
            yield return file.Kind switch
            {
                RecordKind.DeviceRegister => new Located<ReadRecord>(new RegisterRecord(DeviceMapping.Read(r)), r.GetInt64(DeviceMapping.Columns.Split(", ").Length + 1)),
                RecordKind.TripTests => Trip(rows.Trip(r)),
                RecordKind.ContactResistance => Contact(rows.Contact(r)),
                RecordKind.InsulationResistance => Insulation(rows.Insulation(r)),
                RecordKind.CurveTable => new(new CurveRowRecord(new CurveTableRow(r.GetString(0), new CurveTablePoint(CurrentMultiple.Of(r.GetDouble(1)), Seconds.Of(r.GetDouble(2)),
                    r.IsDBNull(3) ? null : Seconds.Of(r.GetDouble(3))))), r.GetInt64(4)),
                RecordKind.AmbientTable => new(new AmbientRowRecord(new AmbientTableRow(r.GetString(0), new AmbientPoint(Celsius.Of(r.GetDouble(1)), r.GetDouble(2)))), r.GetInt64(3)),
                _ => new(new CalibrationRecord(new InstrumentCalibration(r.GetString(0), r.GetString(1), r.GetString(2), Date(r.GetString(3)), Date(r.GetString(4)))
                {
                    Accuracy = InstrumentAccuracyColumns.Read(r, 6),
                }), r.GetInt64(5)),
            };
        }
    }

    /// <summary>Reads the rows of <see cref="ChangesSql"/>.</summary>
    public static List<StoredChange> Changes(DbDataReader r)
    {
        var list = new List<StoredChange>();
        while (r.Read())
        {
            list.Add(new StoredChange(r.GetString(1), r.GetString(2), r.GetString(3), r.GetString(4), r.GetString(5), r.GetString(6), r.GetString(7),
                MomentText.Read(r.GetString(8))));
        }

        return list;
    }

    /// <summary>Reads `source_files` rows (id, file_name, full_path, sha256, kind, rows_read, imported_at as text) as files.</summary>
    public static List<StoredFile> Files(DbDataReader r)
    {
        var list = new List<StoredFile>();
        while (r.Read())
        {
            list.Add(new StoredFile(r.GetInt64(0), r.GetString(1), r.GetString(2), r.GetString(3), RecordKindCodes.Book.Decode(r.GetString(4)), r.GetInt64(5),
                MomentText.Read(r.GetString(6))));
        }

        return list;
    }

    /// <summary>Every committed imported file, oldest first (an import in progress has a placeholder hash and is left out).</summary>
    public string FilesSql => $"SELECT id, file_name, full_path, sha256, kind, rows_read, {dialect.Text("imported_at")} FROM source_files WHERE sha256 NOT LIKE 'pending:%' ORDER BY id";

    private string Id => dialect.P("id");

    private string Measurements(MeasurementTable table)
    {
        var alias = table.Alias;
        return $"SELECT {table.Selected}{dialect.TestTimeColumns(alias)} FROM {table.Table} {alias} JOIN devices d ON d.id = {alias}.device_id "
            + $"WHERE {alias}.source_file_id = {Id} ORDER BY {alias}.source_line, {alias}.id";
    }

    private static Located<ReadRecord> Trip(StoredTrip t) => new(new TripRecord(t.Measurement), t.SourceLine);

    private static Located<ReadRecord> Contact(StoredMeasurement<ContactMeasurement> c) => new(new ContactRecord(c.Measurement), c.SourceLine);

    private static Located<ReadRecord> Insulation(StoredMeasurement<InsulationMeasurement> i) => new(new InsulationRecord(i.Measurement), i.SourceLine);

    private static DateOnly Date(string text) => DateOnly.ParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture);
}
