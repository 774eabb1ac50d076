using System.Data;
using System.Data.Common;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>
/// What one database does differently from another, and nothing else: how a parameter and a tag are written in SQL,
/// how it keeps a test time and a moment, and how a value is turned to text. <see cref="RelationalStore"/> writes every
/// query once with these; a third database is one more dialect.
/// </summary>
public abstract class StoreDialect
{
    /// <summary>
    /// The join from devices to their records that walks them in the order written. SQLite keeps a CROSS JOIN's order
    /// (devices by their tag index, then each device's records), the server plans its own.
    /// </summary>
    public abstract string DeviceJoin { get; }

    /// <summary>The placeholder of the parameter <paramref name="name"/> in SQL.</summary>
    public abstract string P(string name);

    /// <summary>
    /// Sets the parameter <paramref name="name"/>, adding it on first use, to a value that is never empty: its type
    /// follows the value's. An empty value has no type to follow, so it goes through <see cref="SetText"/> or
    /// <see cref="SetNumber"/>, which say the column's type.
    /// </summary>
    public void Set(DbCommand command, string name, object value)
    {
        if (value is null or DBNull)
        {
            throw new ArgumentException($"parameter '{name}' was given no value; an empty value is set through SetText or SetNumber", nameof(value));
        }

        Parameter(command, name).Value = value;
    }

    /// <summary>Sets a text parameter that may be empty: an empty one is still sent as text.</summary>
    public void SetText(DbCommand command, string name, string? value) => Typed(command, name, DbType.String, value);

    /// <summary>Sets a number parameter that may be empty: an empty one is still sent as a number.</summary>
    public void SetNumber(DbCommand command, string name, double? value) => Typed(command, name, DbType.Double, value);

    /// <summary>The parameter <paramref name="name"/> of <paramref name="command"/>, added on first use.</summary>
    protected abstract DbParameter Parameter(DbCommand command, string name);

    private void Typed(DbCommand command, string name, DbType type, object? value)
    {
        var parameter = Parameter(command, name);
        parameter.DbType = type;
        parameter.Value = value ?? DBNull.Value;
    }

    /// <summary>A calendar date as the value of its column.</summary>
    public abstract object Date(DateOnly date);

    /// <summary>A record fingerprint (lower-case hex) as the value of its column.</summary>
    public abstract object FingerprintValue(string hex);

    /// <summary>The condition that <paramref name="column"/> holds the tag the parameter "tag" names, folded on A to Z as <c>AssetTag</c> folds.</summary>
    public abstract string TagIs(string column);

    /// <summary>Every device, or only the one the parameter "tag" names when it is not null.</summary>
    public abstract string AnyOrTag(string column);

    /// <summary>The register columns of <paramref name="alias"/>, readable by <c>DeviceMapping.Read</c> (dates and settings as text).</summary>
    public abstract string RegisterSelect(string alias);

    /// <summary>The register values as parameters, in the order of <c>DeviceMapping.Columns</c>, cast to the columns' types.</summary>
    public abstract string RegisterValues { get; }

    /// <summary>What follows a measurement's columns for its test time: empty where tested_at says it all.</summary>
    public abstract string TestTimeColumns(string alias);

    /// <summary>How many columns <see cref="TestTimeColumns"/> adds.</summary>
    public abstract int TestTimeColumnCount { get; }

    /// <summary>A row's test time: tested_at at <paramref name="at"/>, with the columns <see cref="TestTimeColumns"/> added from <paramref name="extra"/>.</summary>
    public abstract TestedAt TestedAt(DbDataReader reader, int at, int extra);

    /// <summary>A row's test time, where <see cref="TestTimeColumns"/> came last in the row.</summary>
    public TestedAt TestedAt(DbDataReader reader, int at)
    {
        ArgumentNullException.ThrowIfNull(reader);
        return TestedAt(reader, at, reader.FieldCount - TestTimeColumnCount);
    }

    /// <summary>The assignments that set the columns <see cref="TestTimeColumns"/> names, after a measurement's own in an UPDATE.</summary>
    public abstract string TestTimeSets { get; }

    /// <summary>A row's test time as this database writes it back (<see cref="SetTestTime"/>): read as kept, nothing parsed that need not be.</summary>
    public abstract object TestTime(DbDataReader reader, int at, int extra);

    /// <summary>Sets a test time read by <see cref="TestTime"/>: the tested_at parameter <paramref name="name"/> and those of <see cref="TestTimeSets"/>.</summary>
    public abstract void SetTestTime(DbCommand command, string name, object time);

    /// <summary>Sets a measurement column's value as its column's type, empty ones included.</summary>
    public abstract void SetValue(DbCommand command, string name, object value);

    /// <summary>A row's test time as text, as it is stored on SQLite and hashed: where <see cref="TestTimeColumns"/> came last.</summary>
    public string TestedAtText(DbDataReader reader, int at)
    {
        ArgumentNullException.ThrowIfNull(reader);
        return TestedAtText(reader, at, reader.FieldCount - TestTimeColumnCount);
    }

    /// <summary>A row's test time as text, with the columns <see cref="TestTimeColumns"/> added from <paramref name="extra"/>.</summary>
    public virtual string TestedAtText(DbDataReader reader, int at, int extra) => TestedAt(reader, at, extra).ToString();

    /// <summary>A moment the tool records, as the value of its column.</summary>
    public abstract object Moment(DateTimeOffset at);

    /// <summary>A moment the tool recorded, read back.</summary>
    public abstract DateTimeOffset Moment(DbDataReader reader, int at);

    /// <summary>A number column as text inside SQL, the way the store has always shown it in a correction's record.</summary>
    public abstract string NumberText(string column);

    /// <summary>A date, timestamp or fingerprint column as text: yyyy-MM-dd, ISO 8601 UTC, lower-case hex.</summary>
    public abstract string Text(string column);

    /// <summary>A fingerprint parameter (hex text) as the column keeps it.</summary>
    public abstract string Fingerprint(string placeholder);
}
