using System.Data.Common;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage;

public abstract partial class RelationalStore
{
    /// <summary>The register import (<see cref="RegisterMerge"/>) in <paramref name="transaction"/>.</summary>
    protected (long Added, long Updated, long Duplicates) ImportRegister(DbTransaction transaction, ParsedFile file, long sourceId, DateTimeOffset now)
    {
        ArgumentNullException.ThrowIfNull(file);
        Dictionary<string, (long Id, List<Device> Revisions)> stored;
        using (var select = Command(
            $"SELECT d.id, d.asset_tag, {Dialect.RegisterSelect("r")} FROM device_revisions r JOIN devices d ON d.id = r.device_id ORDER BY r.id", transaction))
        using (var reader = select.ExecuteReader())
        {
            stored = RegisterMerge.Stored(reader);
        }

        var (tag, source, line) = (Dialect.P("tag"), Dialect.P("source"), Dialect.P("line"));
        using var insert = Command(
            $"INSERT INTO devices (asset_tag, {DeviceMapping.Columns}, source_file_id, source_line) VALUES ({tag}, {Dialect.RegisterValues}, {source}, {line}) RETURNING id",
            transaction);
        using var revision = Command(
            $"INSERT INTO device_revisions (device_id, {DeviceMapping.Columns}, source_file_id, source_line, recorded_at) "
            + $"VALUES ({Dialect.P("device")}, {Dialect.RegisterValues}, {source}, {line}, {Dialect.P("at")})", transaction);
        Dialect.Set(revision, "at", Dialect.Moment(now));
        using var update = Command(
            $"UPDATE devices SET ({DeviceMapping.Columns}, source_file_id, source_line) = ({Dialect.RegisterValues}, {source}, {line}) "
            + $"WHERE {Dialect.TagIs("asset_tag")}", transaction);
        return RegisterMerge.Run(file.Devices, stored,
            (device, at) =>
            {
                Bind(insert, device, sourceId, at);
                return Convert.ToInt64(insert.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
            },
            (device, id, at) =>
            {
                Bind(revision, device, sourceId, at);
                Dialect.Set(revision, "device", id);
                revision.ExecuteNonQuery();
            },
            (device, at) =>
            {
                Bind(update, device, sourceId, at);
                update.ExecuteNonQuery();
            });
    }

    private void Bind(DbCommand command, Device device, long sourceId, long line)
    {
        Dialect.Set(command, "tag", device.Tag.Value);
        DeviceMapping.Bind(Dialect, command, device);

        Dialect.Set(command, "source", sourceId);
        Dialect.Set(command, "line", line);
    }
}
