using Npgsql;

namespace TripTestLog.Storage.Postgres;

/// <summary>What the server's measurement batch needs of its store: a transaction and a binary COPY on its connection.</summary>
public sealed partial class PostgresRecordStore
{
    internal NpgsqlTransaction BeginTransaction() => _connection.BeginTransaction();

    internal NpgsqlBinaryImporter Copy(string sql) => _connection.BeginBinaryImport(sql);
}
