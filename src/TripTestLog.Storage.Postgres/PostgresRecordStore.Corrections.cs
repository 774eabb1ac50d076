using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    internal NpgsqlTransaction BeginTransaction() => _connection.BeginTransaction();

    internal NpgsqlBinaryImporter Copy(string sql) => _connection.BeginBinaryImport(sql);
}
