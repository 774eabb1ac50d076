using System.Data.Common;
using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Sqlite;

/// <summary>SQLite's ways: text for times, moments and fingerprints, NOCASE for tags, and a join order kept as written.</summary>
internal sealed class SqliteDialect : StoreDialect
{
    public static SqliteDialect Instance { get; } = new();

    public override string DeviceJoin => "CROSS JOIN";

    public override string P(string name) => "$" + name;

    protected override DbParameter Parameter(DbCommand command, string name)
    {
        var parameters = ((SqliteCommand)command).Parameters;
        var key = P(name);
        return parameters.Contains(key) ? parameters[key] : parameters.Add(new SqliteParameter { ParameterName = key });
    }

    public override object Date(DateOnly date) => date.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);

    public override object FingerprintValue(string hex) => hex;

    public override string TagIs(string column) => $"{column} = $tag COLLATE NOCASE";

    public override string AnyOrTag(string column) => $"$tag IS NULL OR {TagIs(column)}";

    public override string RegisterSelect(string alias) => string.Join(", ", DeviceMapping.Columns.Split(", ").Select(c => alias + "." + c));

    public override string RegisterValues { get; } = string.Join(", ", DeviceMapping.Parameters.Select(p => "$" + p));

    public override string TestTimeColumns(string alias) => "";

    public override int TestTimeColumnCount => 0;

    public override TestedAt TestedAt(DbDataReader reader, int at, int extra) => Domain.Measurements.TestedAt.Parse(reader.GetString(at));

    public override string TestedAtText(DbDataReader reader, int at, int extra) => reader.GetString(at);

    public override string TestTimeSets => "";

    public override object TestTime(DbDataReader reader, int at, int extra) => reader.GetString(at);

    public override void SetTestTime(DbCommand command, string name, object time) => Set(command, name, time);

    // SQLite keeps a value as given, an empty one (DBNull) included: a column has no type to send it as.
    public override void SetValue(DbCommand command, string name, object value) => Parameter(command, name).Value = value;

    public override object Moment(DateTimeOffset at) => MomentText.Write(at);

    public override DateTimeOffset Moment(DbDataReader reader, int at) => MomentText.Read(reader.GetString(at));

    public override string NumberText(string column) => column;

    public override string Text(string column) => column;

    public override string Fingerprint(string placeholder) => placeholder;
}
