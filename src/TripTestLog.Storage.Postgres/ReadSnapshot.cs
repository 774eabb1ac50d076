using System.Data;
using Npgsql;
using NpgsqlTypes;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Postgres;

/// <summary>
/// Several connections that read one consistent state of the database: the streaming read runs its ordered queries
/// side by side (a connection serves one reader at a time), and each joins the first one's exported snapshot, so an
/// import that commits meanwhile is seen by none of them or by all. Readers take no locks that block a writer.
/// </summary>
internal sealed class ReadSnapshot : IReadScope
{
    private readonly PostgresRecordStore _store;
    private readonly List<(NpgsqlConnection Connection, NpgsqlTransaction Transaction)> _open = [];
    private string? _snapshot;

    public ReadSnapshot(PostgresRecordStore store) => _store = store;

    /// <summary>A command on a connection of its own in the shared snapshot, with the tag filter bound (null: every device).</summary>
    public System.Data.Common.DbCommand Query(string sql, AssetTag? only = null)
    {
        var connection = _store.Connect();
        var transaction = connection.BeginTransaction(IsolationLevel.RepeatableRead);
        _open.Add((connection, transaction));
        using (var join = new NpgsqlCommand(_snapshot is null ? "SELECT pg_export_snapshot()" : $"SET TRANSACTION SNAPSHOT '{_snapshot}'", connection, transaction))
        {
            var result = join.ExecuteScalar();
            _snapshot ??= (string)result!;
        }

        var command = new NpgsqlCommand(sql, connection, transaction);
        if (sql.Contains("@tag", StringComparison.Ordinal))
        {
            command.Parameters.Add(new NpgsqlParameter("tag", NpgsqlDbType.Text) { Value = (object?)only?.Value ?? DBNull.Value });
        }

        return command;
    }

    public void Dispose()
    {
        foreach (var (connection, transaction) in _open)
        {
            transaction.Dispose();
            connection.Dispose();
        }
    }
}
