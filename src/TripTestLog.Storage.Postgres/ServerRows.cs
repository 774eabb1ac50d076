using System.Data.Common;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage.Postgres;

/// <summary>How the server store reads back what it keeps in its own column types.</summary>
internal static class ServerRows
{
    /// <summary>A test time from its three columns: the wall-clock time at <paramref name="local"/>, then the offset and the has-time flag at <paramref name="offset"/> and the one after.</summary>
    public static TestedAt TestedAt(DbDataReader r, int local, int offset) =>
        Domain.Measurements.TestedAt.Of(r.GetDateTime(local), r.IsDBNull(offset) ? null : TimeSpan.FromMinutes(r.GetInt16(offset)), r.GetBoolean(offset + 1));
}
