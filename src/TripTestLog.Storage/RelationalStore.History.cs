using TripTestLog.Application.Register;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage;

public abstract partial class RelationalStore : IHistorySource
{
    /// <inheritdoc />
    public IReadOnlyList<RegisterRevision> Revisions(AssetTag tag)
    {
        using var select = Command(
            $"SELECT d.asset_tag, {Dialect.RegisterSelect("r")}, f.file_name, r.source_line, r.recorded_at "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id JOIN source_files f ON f.id = r.source_file_id "
            + $"WHERE {Dialect.TagIs("d.asset_tag")} ORDER BY r.id");
        Dialect.Set(select, "tag", tag.Value);
        using var reader = select.ExecuteReader();
        var list = new List<RegisterRevision>();
        var after = DeviceMapping.Columns.Split(", ").Length + 1;
        while (reader.Read())
        {
            list.Add(new RegisterRevision(DeviceMapping.Read(reader), reader.GetString(after), reader.GetInt64(after + 1), Dialect.Moment(reader, after + 2)));
        }

        return list;
    }

    /// <inheritdoc />
    public IReadOnlyList<RecordCorrection> Corrections(AssetTag tag)
    {
        // Each measurement table says in its own words which record a correction touched: its kind, its test time and
        // what tells it from the device's other records that day.
        var sql = string.Join(" UNION ALL ", new[]
        {
            ("trip_tests", "trip test", $"' at ' || {Dialect.NumberText("t.current_a")} || ' A'", "t.tripped"),
            ("contact_tests", "contact test", "' pole ' || t.pole", "(1 = 0)"),
            ("insulation_tests", "insulation test", "' path ' || t.path", "(1 = 0)"),
        }.Select(m =>
            $"SELECT a.id, '{m.Item2}', t.tested_at, {m.Item3}, a.column_name, a.old_value, a.new_value, fo.file_name, fn.file_name, a.changed_at, "
            + $"{m.Item4}{Dialect.TestTimeColumns("t")} "
            + $"FROM audit_changes a JOIN {m.Item1} t ON a.table_name = '{m.Item1}' AND t.id = a.record_id JOIN devices d ON d.id = t.device_id "
            + "JOIN source_files fo ON fo.id = a.old_source_file_id JOIN source_files fn ON fn.id = a.new_source_file_id "
            + $"WHERE {Dialect.TagIs("d.asset_tag")}")) + " ORDER BY 1";
        using var select = Command(sql);
        Dialect.Set(select, "tag", tag.Value);
        using var reader = select.ExecuteReader();
        var list = new List<RecordCorrection>();
        while (reader.Read())
        {
            var record = $"{reader.GetString(1)} {Dialect.TestedAtText(reader, 2)}{reader.GetString(3)}";
            list.Add(new RecordCorrection(record, RecordColumn.Of(reader.GetString(4), Convert.ToBoolean(reader.GetValue(10), System.Globalization.CultureInfo.InvariantCulture)),
                reader.GetString(5), reader.GetString(6), reader.GetString(7), reader.GetString(8), Dialect.Moment(reader, 9)));
        }

        return list;
    }
}
