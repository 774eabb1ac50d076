using System.Data.Common;
using Npgsql;
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

    public override void Set(DbCommand command, string name, object? value) => ServerSql.Set((NpgsqlCommand)command, name, value);

    public override void SetNumber(DbCommand command, string name, double? value)
    {
        var parameters = ((NpgsqlCommand)command).Parameters;
        if (!parameters.Contains(name))
        {
            parameters.Add(new NpgsqlParameter(name, NpgsqlTypes.NpgsqlDbType.Double));
        }

        parameters[name].Value = value is { } v ? v : DBNull.Value;
    }

    public override object Date(DateOnly date) => date;

    public override object FingerprintValue(string hex) => Convert.FromHexString(hex);

    public override string TagIs(string column) => $"{ServerSql.TagKey(column)} = {ServerSql.TagKey("@tag")}";

    public override string AnyOrTag(string column) => $"@tag::text IS NULL OR {TagIs(column)}";

    public override string RegisterSelect(string alias) => ServerSql.RegisterSelect(alias);

    public override string RegisterValues => ServerSql.RegisterValues;

    public override string TestTimeColumns(string alias) => $", {alias}.{ServerColumnTypes.OffsetColumn}, {alias}.{ServerColumnTypes.HasTimeColumn}";

    public override TestedAt TestedAt(DbDataReader reader, int at) => ServerRows.TestedAt(reader, at, reader.FieldCount - 2);

    public override object Moment(DateTimeOffset at) => at.ToUniversalTime();

    public override DateTimeOffset Moment(DbDataReader reader, int at) => reader.GetFieldValue<DateTimeOffset>(at);

    public override string NumberText(string column) => column + "::text";

    public override string Text(string column) => column switch
    {
        "calibrated_on" or "calibration_due" => $"to_char({column}, 'YYYY-MM-DD')",
        "t.fingerprint" => "encode(t.fingerprint, 'hex')",
        _ => $"to_char({column} AT TIME ZONE 'UTC', 'YYYY-MM-DD\"T\"HH24:MI:SS.US\"Z\"')",
    };

    public override string Fingerprint(string placeholder) => $"decode({placeholder}, 'hex')";
}
