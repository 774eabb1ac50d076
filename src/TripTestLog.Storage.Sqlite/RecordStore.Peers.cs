using Microsoft.Data.Sqlite;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Sqlite;

/// <summary>
/// Each device's stored peer positions. A device's stamp counts its trip tests and register entries with their newest
/// ids (read from the indexes alone, so a group's stamps cost little): an import adds rows and a register change adds an
/// entry, so positions worked out before either are no longer used. A correction changes stored values in place, so the
/// newest correction's id is part of the reference stamp: after one, every device's positions are worked out again.
/// </summary>
public sealed partial class RecordStore : IPeerPositionStore
{
    private const string DeviceStamp =
        "(SELECT COUNT(*) || ':' || IFNULL(MAX(t.id), 0) FROM trip_tests t WHERE t.device_id = d.id) || '/' "
        + "|| (SELECT COUNT(*) || ':' || IFNULL(MAX(r.id), 0) || ':' || IFNULL(MAX(r.source_file_id), 0) FROM device_revisions r WHERE r.device_id = d.id) || '/' "
        + "|| d.source_file_id";

    /// <inheritdoc />
    public string ReferenceStamp()
    {
        using var select = _connection.CreateCommand();
        select.CommandText = string.Join(" || '|' || ", new[] { "instruments", "curve_table_rows", "ambient_table_rows" }.Select(table =>
            $"(SELECT COUNT(*) || ':' || IFNULL(MAX(id), 0) || ':' || IFNULL(MAX(source_file_id), 0) FROM {table})")).Insert(0, "SELECT ")
            + " || '|' || (SELECT IFNULL(MAX(id), 0) FROM audit_changes)";
        return (string)select.ExecuteScalar()!;
    }

    /// <inheritdoc />
    public IReadOnlyList<StoredPeer> StoredPeersOf(AssetTag tag)
    {
        using var snapshot = ReadTransaction.Begin(_connection);
        using var select = TagQuery(
            $"WITH peers AS (SELECT d.id, d.asset_tag, {DeviceStamp} AS now FROM devices d WHERE {PeerDevices}) "
            + "SELECT peers.asset_tag, peers.now, s.basis, s.stamp, p.group_key, p.position FROM peers "
            + "LEFT JOIN peer_stamps s ON s.device_id = peers.id LEFT JOIN peer_positions p ON p.device_id = peers.id AND s.device_id IS NOT NULL "
            + "ORDER BY peers.asset_tag, p.id", tag);
        using var reader = select.ExecuteReader();
        var peers = new List<StoredPeer>();
        string? current = null;
        List<(string, double)> positions = [];
        while (reader.Read())
        {
            var peerTag = reader.GetString(0);
            if (peerTag != current)
            {
                current = peerTag;
                positions = [];
                peers.Add(new StoredPeer(AssetTag.Of(peerTag), reader.IsDBNull(2) ? null : reader.GetString(2), reader.IsDBNull(3) ? null : reader.GetString(3),
                    reader.GetString(1), positions));
            }

            if (!reader.IsDBNull(4))
            {
                positions.Add((reader.GetString(4), reader.GetDouble(5)));
            }
        }

        return peers;
    }

    /// <inheritdoc />
    public IReadOnlyList<(AssetTag Tag, string Stamp)> StalePeers(string basis)
    {
        ReadingMany();
        using var snapshot = ReadTransaction.Begin(_connection);
        using var select = _connection.CreateCommand();
        select.CommandText = $"SELECT d.asset_tag, {DeviceStamp} AS now, s.basis, s.stamp FROM devices d LEFT JOIN peer_stamps s ON s.device_id = d.id ORDER BY d.asset_tag";
        using var reader = select.ExecuteReader();
        var stale = new List<(AssetTag, string)>();
        while (reader.Read())
        {
            var now = reader.GetString(1);
            if (reader.IsDBNull(2) || reader.GetString(2) != basis || reader.GetString(3) != now)
            {
                stale.Add((AssetTag.Of(reader.GetString(0)), now));
            }
        }

        return stale;
    }

    /// <inheritdoc />
    public IReadOnlyList<AssetTag> CurrentPositions(string basis, Action<string, double> add)
    {
        ArgumentNullException.ThrowIfNull(add);
        ReadingMany();
        using var snapshot = ReadTransaction.Begin(_connection);
        using var select = _connection.CreateCommand();
        select.CommandText = $"WITH now AS (SELECT d.id, d.asset_tag, {DeviceStamp} AS stamp FROM devices d) "
            + "SELECT now.asset_tag, IFNULL(s.basis = $basis AND s.stamp = now.stamp, 0), p.group_key, p.position FROM now "
            + "LEFT JOIN peer_stamps s ON s.device_id = now.id LEFT JOIN peer_positions p ON p.device_id = now.id ORDER BY now.asset_tag";
        select.Parameters.AddWithValue("$basis", basis);
        using var reader = select.ExecuteReader();
        var stale = new List<AssetTag>();
        string? last = null;
        while (reader.Read())
        {
            if (reader.GetInt64(1) == 0)
            {
                // A stale device's stored rows, one for each of its old positions: it is listed once.
                var tag = reader.GetString(0);
                if (tag != last)
                {
                    stale.Add(AssetTag.Of(tag));
                    last = tag;
                }
            }
            else if (!reader.IsDBNull(2))
            {
                add(reader.GetString(2), reader.GetDouble(3));
            }
        }

        return stale;
    }

    /// <inheritdoc />
    public void StorePeerPositions(IEnumerable<DevicePeerPositions> devices)
    {
        using var transaction = BeginWriting();
        using var id = NativeCommand("SELECT id FROM devices WHERE asset_tag = $tag COLLATE NOCASE", transaction);
        using var clear = NativeCommand("DELETE FROM peer_positions WHERE device_id = $id", transaction);
        using var stamp = NativeCommand("INSERT OR REPLACE INTO peer_stamps (device_id, basis, stamp) VALUES ($id, $basis, $stamp)", transaction);
        using var insert = NativeCommand("INSERT INTO peer_positions (device_id, group_key, position) VALUES ($id, $group, $position)", transaction);
        var tagParameter = id.Parameters.Add("$tag", SqliteType.Text);
        var clearId = clear.Parameters.Add("$id", SqliteType.Integer);
        var (stampId, basis, stampValue) = (stamp.Parameters.Add("$id", SqliteType.Integer), stamp.Parameters.Add("$basis", SqliteType.Text), stamp.Parameters.Add("$stamp", SqliteType.Text));
        var (insertId, group, position) = (insert.Parameters.Add("$id", SqliteType.Integer), insert.Parameters.Add("$group", SqliteType.Text), insert.Parameters.Add("$position", SqliteType.Real));
        foreach (var device in devices)
        {
            tagParameter.Value = device.Tag.Value;
            if (id.ExecuteScalar() is not long deviceId)
            {
                continue;
            }

            clearId.Value = stampId.Value = insertId.Value = deviceId;
            clear.ExecuteNonQuery();
            (basis.Value, stampValue.Value) = (device.Basis, device.Stamp);
            stamp.ExecuteNonQuery();
            foreach (var (key, value) in device.Positions)
            {
                (group.Value, position.Value) = (key, value);
                insert.ExecuteNonQuery();
            }
        }

        transaction.Commit();
    }
}
