using System.Data.Common;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage;

/// <summary>One consistent state of the database that several queries read, each seeing an import wholly or not at all.</summary>
public interface IReadScope : IDisposable
{
    /// <summary>A query in the scope with the parameter "tag" bound (null: every device).</summary>
    DbCommand Query(string sql, AssetTag? only = null);
}
