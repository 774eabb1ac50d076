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

    public override void Set(DbCommand command, string name, object? value)
    {
        var parameters = ((SqliteCommand)command).Parameters;
        var key = P(name);
        if (parameters.Contains(key))
        {
            parameters[key].Value = value ?? DBNull.Value;
        }
        else
        {
            parameters.AddWithValue(key, value ?? DBNull.Value);
        }
    }

    public override object Date(DateOnly date) => date.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);

    public override object FingerprintValue(string hex) => hex;

    public override string TagIs(string column) => $"{column} = $tag COLLATE NOCASE";

    public override string AnyOrTag(string column) => $"$tag IS NULL OR {TagIs(column)}";

    public override string RegisterSelect(string alias) => string.Join(", ", DeviceMapping.Columns.Split(", ").Select(c => alias + "." + c));

    public override string RegisterValues => DeviceMapping.Parameters;

    public override string TestTimeColumns(string alias) => "";

    public override int TestTimeColumnCount => 0;

    public override TestedAt TestedAt(DbDataReader reader, int at, int extra) => Domain.Measurements.TestedAt.Parse(reader.GetString(at));

    public override string TestedAtText(DbDataReader reader, int at, int extra) => reader.GetString(at);

    public override string TestTimeSets => "";

    public override void SetTestTime(DbCommand command, string name, object text, TestedAt when) => Set(command, name, text);

    public override void SetValue(DbCommand command, string name, object value) => Set(command, name, value);

    public override object Moment(DateTimeOffset at) => MomentText.Write(at);

    public override DateTimeOffset Moment(DbDataReader reader, int at) => MomentText.Read(reader.GetString(at));

    public override string NumberText(string column) => column;

    public override string Text(string column) => column;

    public override string Fingerprint(string placeholder) => placeholder;
}
