using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    /// <summary>The register import (<see cref="RegisterMerge"/>) with the server's statements.</summary>
    private (long Added, long Updated, long Duplicates) ImportRegister(NpgsqlTransaction transaction, ParsedFile file, long sourceId, DateTimeOffset now)
    {
        Dictionary<string, (long Id, List<Device> Revisions)> stored;
        using (var select = Command(
            $"SELECT d.id, d.asset_tag, {ServerSql.RegisterSelect("r")} FROM device_revisions r JOIN devices d ON d.id = r.device_id ORDER BY r.id", transaction))
        using (var reader = select.ExecuteReader())
        {
            stored = RegisterMerge.Stored(reader);
        }

        using var insert = Command(
            $"INSERT INTO devices (asset_tag, {DeviceMapping.Columns}, source_file_id, source_line) VALUES (@tag, {ServerSql.RegisterValues}, @source, @line) RETURNING id",
            transaction);
        using var revision = Command(
            $"INSERT INTO device_revisions (device_id, {DeviceMapping.Columns}, source_file_id, source_line, recorded_at) "
            + $"VALUES (@device, {ServerSql.RegisterValues}, @source, @line, @at)", transaction);
        revision.Parameters.Add(new NpgsqlParameter("at", NpgsqlDbType.TimestampTz) { Value = now.ToUniversalTime() });
        using var update = Command(
            $"UPDATE devices SET ({DeviceMapping.Columns}, source_file_id, source_line) = ({ServerSql.RegisterValues}, @source, @line) "
            + $"WHERE {ServerSql.TagKey("asset_tag")} = {ServerSql.TagKey("@tag")}", transaction);
        return RegisterMerge.Run(file.Devices, stored,
            (device, line) =>
            {
                ServerSql.Bind(insert, device, sourceId, line);
                return (long)insert.ExecuteScalar()!;
            },
            (device, id, line) =>
            {
                ServerSql.Bind(revision, device, sourceId, line);
                ServerSql.Set(revision, "device", id);
                revision.ExecuteNonQuery();
            },
            (device, line) =>
            {
                ServerSql.Bind(update, device, sourceId, line);
                update.ExecuteNonQuery();
            });
    }
}
