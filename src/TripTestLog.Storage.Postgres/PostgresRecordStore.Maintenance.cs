using TripTestLog.Application.Stores;
using TripTestLog.Domain.Devices;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    // Every reference the schema declares, checked by the project as SQLite's foreign_key_check does: the server enforces
    // them on every write, so a broken one means the schema was changed by hand.
    private static readonly (string Table, string Column, string Target)[] References =
    [
        .. RecordTables.Select(t => (t, "source_file_id", "source_files")),
        ("device_revisions", "device_id", "devices"), ("trip_tests", "device_id", "devices"), ("contact_tests", "device_id", "devices"),
        ("insulation_tests", "device_id", "devices"),
    ];

    /// <summary>
    /// Every reference resolves. The server's own page checks (data checksums, amcheck) belong to its administrator and
    /// are not run here.
    /// </summary>
    protected override (IReadOnlyList<string>? Integrity, long BrokenReferences) DatabaseChecks()
    {
        long broken = 0;
        foreach (var (table, column, target) in References)
        {
            broken += Scalar($"SELECT COUNT(*) FROM {table} t WHERE NOT EXISTS (SELECT 1 FROM {target} x WHERE x.id = t.{column})");
        }

        return (null, broken);
    }

    /// <summary>A server database is backed up with the server's own tool; this says so rather than pretending.</summary>
    /// <exception cref="NotSupportedException">Always, with the command to use.</exception>
    public void Backup(string destination) =>
        throw new NotSupportedException(
            $"a PostgreSQL database is backed up with the server's own tool: pg_dump --format=custom --file {destination} (with the same host, user and database); "
            + "restore it with pg_restore");
}
