using System.Data.Common;
using Npgsql;
using NpgsqlTypes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Postgres;

/// <summary>
/// The server's ways: its own column types (<see cref="ServerColumnTypes"/>), typed parameters, tags folded with
/// translate() as SQLite's NOCASE folds them, and a planner that chooses its own join order.
/// </summary>
internal sealed class ServerDialect : StoreDialect
{
    public static ServerDialect Instance { get; } = new();

    public override string DeviceJoin => "JOIN";

    public override string P(string name) => "@" + name;

    protected override DbParameter Parameter(DbCommand command, string name)
    {
        var parameters = ((NpgsqlCommand)command).Parameters;
        return parameters.Contains(name) ? parameters[name] : parameters.Add(new NpgsqlParameter { ParameterName = name });
    }

    public override object Date(DateOnly date) => date;

    public override object FingerprintValue(string hex) => Convert.FromHexString(hex);

    public override string TagIs(string column) => $"{ServerSql.TagKey(column)} = {ServerSql.TagKey("@tag")}";

    public override string AnyOrTag(string column) => $"@tag::text IS NULL OR {TagIs(column)}";

    public override string RegisterSelect(string alias) => ServerSql.RegisterSelect(alias);

    public override string RegisterValues => ServerSql.RegisterValues;

    public override string TestTimeColumns(string alias) => $", {alias}.{ServerColumnTypes.OffsetColumn}, {alias}.{ServerColumnTypes.HasTimeColumn}";

    public override int TestTimeColumnCount => 2;

    public override TestedAt TestedAt(DbDataReader reader, int at, int extra) => ServerRows.TestedAt(reader, at, extra);

    public override string TestTimeSets => $", {ServerColumnTypes.OffsetColumn} = @offset, {ServerColumnTypes.HasTimeColumn} = @hastime";

    public override object TestTime(DbDataReader reader, int at, int extra) => ServerRows.TestedAt(reader, at, extra);

    public override void SetTestTime(DbCommand command, string name, object time)
    {
        var when = (TestedAt)time;
        var parameters = ((NpgsqlCommand)command).Parameters;
        parameters.Add(new NpgsqlParameter(name, NpgsqlDbType.Timestamp) { Value = DateTime.SpecifyKind(when.Local, DateTimeKind.Unspecified) });
        parameters.Add(new NpgsqlParameter("offset", NpgsqlDbType.Smallint) { Value = when.Offset is { } o ? (short)o.TotalMinutes : DBNull.Value });
        parameters.Add(new NpgsqlParameter("hastime", NpgsqlDbType.Boolean) { Value = when.HasTime });
    }

    public override void SetValue(DbCommand command, string name, object value) =>
        ((NpgsqlCommand)command).Parameters.Add(new NpgsqlParameter(name, value switch
        {
            string => NpgsqlDbType.Text,
            long => NpgsqlDbType.Bigint,
            bool => NpgsqlDbType.Boolean,
            _ => NpgsqlDbType.Double,
        })
        {
            Value = value,
        });

    public override object Moment(DateTimeOffset at) => at.ToUniversalTime();

    public override DateTimeOffset Moment(DbDataReader reader, int at) => reader.GetFieldValue<DateTimeOffset>(at);

    public override string NumberText(string column) => column + "::text";

    public override string Text(string column) => column switch
    {
        "calibrated_on" or "calibration_due" => $"to_char({column}, 'YYYY-MM-DD')",
        _ when column.EndsWith("fingerprint", StringComparison.Ordinal) => $"encode({column}, 'hex')",
        _ => $"to_char({column} AT TIME ZONE 'UTC', 'YYYY-MM-DD\"T\"HH24:MI:SS.US\"Z\"')",
    };

    public override string Fingerprint(string placeholder) => $"decode({placeholder}, 'hex')";
}
