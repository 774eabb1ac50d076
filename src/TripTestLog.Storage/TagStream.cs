using System.Data.Common;

namespace TripTestLog.Storage;

/// <summary>
/// One query's rows in asset-tag order (column 0), handed out one device at a time as the register walk reaches it.
/// The register and every stream order by the same binary collation, so a row's device is never behind the walk.
/// </summary>
/// <typeparam name="T">What a row becomes.</typeparam>
internal sealed class TagStream<T> : IDisposable
{
    private readonly DbCommand _command;
    private readonly DbDataReader _reader;
    private readonly Func<DbDataReader, T> _read;
    private bool _more;

    public TagStream(DbCommand command, Func<DbDataReader, T> read)
    {
        _command = command;
        _reader = command.ExecuteReader();
        _read = read;
        _more = _reader.Read();
    }

    /// <summary>The rows of <paramref name="tag"/>; rows of tags before it (devices without a register entry) are skipped.</summary>
    public List<T> Take(string tag)
    {
        var list = new List<T>();
        while (_more && string.CompareOrdinal(_reader.GetString(0), tag) <= 0)
        {
            if (string.Equals(_reader.GetString(0), tag, StringComparison.Ordinal))
            {
                list.Add(_read(_reader));
            }

            _more = _reader.Read();
        }

        return list;
    }

    public void Dispose()
    {
        _reader.Dispose();
        _command.Dispose();
    }
}
