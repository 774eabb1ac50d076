using System.Globalization;
using TripTestLog.Application.Register;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore : IHistorySource
{
    /// <inheritdoc />
    public IReadOnlyList<RegisterRevision> Revisions(AssetTag tag)
    {
        using var select = _connection.CreateCommand();
        select.CommandText =
            $"SELECT d.asset_tag, {string.Join(", ", RegisterColumns.Split(", ").Select(c => "r." + c))}, f.file_name, r.source_line, r.recorded_at "
            + "FROM device_revisions r JOIN devices d ON d.id = r.device_id JOIN source_files f ON f.id = r.source_file_id "
            + "WHERE d.asset_tag = $tag COLLATE NOCASE ORDER BY r.id";
        select.Parameters.AddWithValue("$tag", tag.Value);
        using var reader = select.ExecuteReader();
        var list = new List<RegisterRevision>();
        var after = DeviceMapping.Columns.Split(", ").Length + 1;
        while (reader.Read())
        {
            list.Add(new RegisterRevision(DeviceMapping.Read(reader), reader.GetString(after), reader.GetInt64(after + 1), MomentText.Read(reader.GetString(after + 2))));
        }

        return list;
    }

    /// <inheritdoc />
    public IReadOnlyList<RecordCorrection> Corrections(AssetTag tag)
    {
        // Each measurement table says in its own words which record a correction touched.
        const string Sql = """
            SELECT 'trip test ' || t.tested_at || ' at ' || t.current_a || ' A', a.column_name, a.old_value, a.new_value, fo.file_name, fn.file_name, a.changed_at, a.id, t.tripped
              FROM audit_changes a JOIN trip_tests t ON a.table_name = 'trip_tests' AND t.id = a.record_id JOIN devices d ON d.id = t.device_id
              JOIN source_files fo ON fo.id = a.old_source_file_id JOIN source_files fn ON fn.id = a.new_source_file_id WHERE d.asset_tag = $tag COLLATE NOCASE
            UNION ALL
            SELECT 'contact test ' || t.tested_at || ' pole ' || t.pole, a.column_name, a.old_value, a.new_value, fo.file_name, fn.file_name, a.changed_at, a.id, 0
              FROM audit_changes a JOIN contact_tests t ON a.table_name = 'contact_tests' AND t.id = a.record_id JOIN devices d ON d.id = t.device_id
              JOIN source_files fo ON fo.id = a.old_source_file_id JOIN source_files fn ON fn.id = a.new_source_file_id WHERE d.asset_tag = $tag COLLATE NOCASE
            UNION ALL
            SELECT 'insulation test ' || t.tested_at || ' path ' || t.path, a.column_name, a.old_value, a.new_value, fo.file_name, fn.file_name, a.changed_at, a.id, 0
              FROM audit_changes a JOIN insulation_tests t ON a.table_name = 'insulation_tests' AND t.id = a.record_id JOIN devices d ON d.id = t.device_id
              JOIN source_files fo ON fo.id = a.old_source_file_id JOIN source_files fn ON fn.id = a.new_source_file_id WHERE d.asset_tag = $tag COLLATE NOCASE
            ORDER BY 8
            """;
        using var select = _connection.CreateCommand();
        select.CommandText = Sql;
        select.Parameters.AddWithValue("$tag", tag.Value);
        using var reader = select.ExecuteReader();
        var list = new List<RecordCorrection>();
        while (reader.Read())
        {
            list.Add(new RecordCorrection(reader.GetString(0), RecordColumn.Of(reader.GetString(1), reader.GetInt64(8) != 0), reader.GetString(2), reader.GetString(3), reader.GetString(4),
                reader.GetString(5), MomentText.Read(reader.GetString(6))));
        }

        return list;
    }
}
