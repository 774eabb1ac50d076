using NpgsqlTypes;
using TripTestLog.Application.Register;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore : IHistorySource
{
    /// <inheritdoc />
    public IReadOnlyList<RegisterRevision> Revisions(AssetTag tag)
    {
        using var select = Command(
            $"SELECT d.asset_tag, {ServerSql.RegisterSelect("r")}, f.file_name, r.source_line, r.recorded_at "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id JOIN source_files f ON f.id = r.source_file_id "
            + $"WHERE {ServerSql.TagKey("d.asset_tag")} = {ServerSql.TagKey("@tag")} ORDER BY r.id");
        select.Parameters.Add(Text("tag", tag.Value));
        using var reader = select.ExecuteReader();
        var list = new List<RegisterRevision>();
        var after = DeviceMapping.Columns.Split(", ").Length + 1;
        while (reader.Read())
        {
            list.Add(new RegisterRevision(DeviceMapping.Read(reader), reader.GetString(after), reader.GetInt64(after + 1), reader.GetFieldValue<DateTimeOffset>(after + 2)));
        }

        return list;
    }

    /// <inheritdoc />
    public IReadOnlyList<RecordCorrection> Corrections(AssetTag tag)
    {
        // Each measurement table says in its own words which record a correction touched; the test time is written as
        // the SQLite store writes it, from its parts.
        var sql = string.Join(" UNION ALL ", new[]
        {
            ("trip_tests", "trip test", "' at ' || t.current_a::text || ' A'", "t.tripped"),
            ("contact_tests", "contact test", "' pole ' || t.pole", "false"),
            ("insulation_tests", "insulation test", "' path ' || t.path", "false"),
        }.Select(m =>
            $"SELECT a.id, '{m.Item2}', t.tested_at, t.{ServerColumnTypes.OffsetColumn}, t.{ServerColumnTypes.HasTimeColumn}, {m.Item3}, "
            + $"a.column_name, a.old_value, a.new_value, fo.file_name, fn.file_name, a.changed_at, {m.Item4} "
            + $"FROM audit_changes a JOIN {m.Item1} t ON a.table_name = '{m.Item1}' AND t.id = a.record_id JOIN devices d ON d.id = t.device_id "
            + "JOIN source_files fo ON fo.id = a.old_source_file_id JOIN source_files fn ON fn.id = a.new_source_file_id "
            + $"WHERE {ServerSql.TagKey("d.asset_tag")} = {ServerSql.TagKey("@tag")}")) + " ORDER BY 1";
        using var select = Command(sql);
        select.Parameters.Add(new Npgsql.NpgsqlParameter("tag", NpgsqlDbType.Text) { Value = tag.Value });
        using var reader = select.ExecuteReader();
        var list = new List<RecordCorrection>();
        while (reader.Read())
        {
            var record = $"{reader.GetString(1)} {ServerRows.TestedAt(reader, 2, 3)}{reader.GetString(5)}";
            list.Add(new RecordCorrection(record, RecordColumn.Of(reader.GetString(6), reader.GetBoolean(12)), reader.GetString(7), reader.GetString(8),
                reader.GetString(9), reader.GetString(10), reader.GetFieldValue<DateTimeOffset>(11)));
        }

        return list;
    }
}
