using System.Data.Common;
using System.Globalization;

namespace TripTestLog.Storage;

/// <summary>
/// The store on any relational database, each aspect written once over <see cref="DbConnection"/>; what a database does
/// its own way is its <see cref="StoreDialect"/>, and how it opens, begins a write and reads a snapshot is its subclass.
/// </summary>
public abstract partial class RelationalStore
{
    /// <summary>A store on <paramref name="connection"/>, open, speaking <paramref name="dialect"/>.</summary>
    protected RelationalStore(DbConnection connection, StoreDialect dialect)
    {
        Connection = connection;
        Dialect = dialect;
    }

    /// <summary>The store's own connection.</summary>
    protected DbConnection Connection { get; }

    /// <summary>What the database does its own way.</summary>
    protected StoreDialect Dialect { get; }

    /// <summary>Begins a transaction that writes, waiting for another writer as the lab policy allows.</summary>
    protected abstract DbTransaction BeginWrite();

    /// <summary>Begins a read of one consistent state.</summary>
    protected abstract IReadScope BeginRead();

    /// <summary>Called before a read of many devices or a whole file's records, for a store that reads those differently.</summary>
    protected virtual void ReadingMany()
    {
    }

    /// <summary>A command on the store's connection, in <paramref name="transaction"/> when given.</summary>
    protected DbCommand Command(string sql, DbTransaction? transaction = null)
    {
        var command = Connection.CreateCommand();
        command.CommandText = sql;
        command.Transaction = transaction;
        return command;
    }

    /// <summary>The one number <paramref name="sql"/> selects.</summary>
    protected long Scalar(string sql, DbTransaction? transaction = null)
    {
        using var command = Command(sql, transaction);
        return Convert.ToInt64(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    /// <summary>Every row <paramref name="sql"/> selects, read by <paramref name="read"/>; for the small tables read whole.</summary>
    protected List<T> Rows<T>(string sql, Func<DbDataReader, T> read)
    {
        using var select = Command(sql);
        using var reader = select.ExecuteReader();
        var rows = new List<T>();
        while (reader.Read())
        {
            rows.Add(read(reader));
        }

        return rows;
    }

    /// <summary>Source file names by id, read in <paramref name="connection"/>'s current transaction.</summary>
    protected static Dictionary<long, string> SourceFileNames(DbConnection connection)
    {
        using var select = connection.CreateCommand();
        select.CommandText = "SELECT id, file_name FROM source_files";
        using var reader = select.ExecuteReader();
        var names = new Dictionary<long, string>();
        while (reader.Read())
        {
            names[reader.GetInt64(0)] = reader.GetString(1);
        }

        return names;
    }
}
