using TripTestLog.Application.Stores;
using TripTestLog.Domain.Devices;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    private static readonly string[] RecordTables = ["devices", "device_revisions", "trip_tests", "contact_tests", "insulation_tests", "curve_table_rows", "ambient_table_rows", "instruments"];

    // Every reference the schema declares, checked by the project as SQLite's foreign_key_check does: the server enforces
    // them on every write, so a broken one means the schema was changed by hand.
    private static readonly (string Table, string Column, string Target)[] References =
    [
        .. RecordTables.Select(t => (t, "source_file_id", "source_files")),
        ("device_revisions", "device_id", "devices"), ("trip_tests", "device_id", "devices"), ("contact_tests", "device_id", "devices"),
        ("insulation_tests", "device_id", "devices"),
    ];

    /// <inheritdoc />
    public StoreCounts Counts() => new(
        Scalar("SELECT COUNT(*) FROM source_files"),
        Scalar("SELECT COUNT(*) FROM devices"),
        Scalar("SELECT COUNT(*) FROM trip_tests"),
        Scalar("SELECT COUNT(*) FROM contact_tests"),
        Scalar("SELECT COUNT(*) FROM insulation_tests"));

    /// <inheritdoc />
    public IReadOnlyDictionary<string, DeviceHistory> Histories(AssetTag? only = null)
    {
        using var select = Command(
            $"SELECT d.asset_tag, {ServerSql.RegisterSelect("r")} FROM device_revisions r JOIN devices d ON d.id = r.device_id "
            + $"WHERE @tag::text IS NULL OR {ServerSql.TagKey("d.asset_tag")} = {ServerSql.TagKey("@tag")} ORDER BY d.asset_tag, r.id");
        select.Parameters.Add(Text("tag", only?.Value));
        using var reader = select.ExecuteReader();
        return DeviceMapping.Histories(reader);
    }

    /// <summary>
    /// The project's checks on the server: every reference resolves, every record traces to an imported file, and every
    /// imported file still at its recorded path (on this machine) has the hash it had when imported. The server's own
    /// page checks (data checksums, amcheck) belong to its administrator and are not run here.
    /// </summary>
    public VerifyReport Verify()
    {
        long broken = 0;
        foreach (var (table, column, target) in References)
        {
            broken += Scalar($"SELECT COUNT(*) FROM {table} t WHERE NOT EXISTS (SELECT 1 FROM {target} x WHERE x.id = t.{column})");
        }

        long untraced = 0;
        foreach (var table in RecordTables)
        {
            untraced += Scalar($"SELECT COUNT(*) FROM {table} t WHERE NOT EXISTS (SELECT 1 FROM source_files f WHERE f.id = t.source_file_id)");
        }

        var counts = new Dictionary<long, long>();
        foreach (var table in RecordTables.Where(t => t != "devices"))
        {
            foreach (var (id, n) in Rows($"SELECT source_file_id, COUNT(*) FROM {table} GROUP BY source_file_id", r => (r.GetInt64(0), r.GetInt64(1))))
            {
                counts[id] = counts.GetValueOrDefault(id) + n;
            }
        }

        var files = Rows("SELECT id, file_name, full_path, sha256 FROM source_files ORDER BY id",
            r => new SourceFileRow { Id = r.GetInt64(0), FileName = r.GetString(1), FullPath = r.GetString(2), Sha256 = r.GetString(3) });
        var fingerprints = new FingerprintCheck();
        foreach (var table in FingerprintCheck.Tables)
        {
            var n = table.Columns.Length;
            using var select = Command(
                $"SELECT {string.Join(", ", table.Columns.Select(c => "t." + c))}, t.{ServerColumnTypes.OffsetColumn}, t.{ServerColumnTypes.HasTimeColumn}, "
                + $"encode(t.fingerprint, 'hex'), f.file_name, t.source_line FROM {table.Table} t LEFT JOIN source_files f ON f.id = t.source_file_id");
            using var reader = select.ExecuteReader();
            while (reader.Read())
            {
                var values = Enumerable.Range(0, n).Select(reader.GetValue).ToArray();
                values[MeasurementTable.TestedAtColumn] = ServerRows.TestedAt(reader, MeasurementTable.TestedAtColumn, n).ToString();
                fingerprints.Check(table, values, reader.GetString(n + 2), reader.IsDBNull(n + 3) ? null : reader.GetString(n + 3), reader.GetInt64(n + 4));
            }
        }

        return new VerifyReport([], broken, untraced, ImportedFiles.Check(files, counts))
        {
            IntegrityCheck = null, AlteredRecords = fingerprints.Altered, AlteredExamples = fingerprints.ExamplesFound,
        };
    }

    /// <summary>A server database is backed up with the server's own tool; this says so rather than pretending.</summary>
    /// <exception cref="NotSupportedException">Always, with the command to use.</exception>
    public void Backup(string destination) =>
        throw new NotSupportedException(
            $"a PostgreSQL database is backed up with the server's own tool: pg_dump --format=custom --file {destination} (with the same host, user and database); "
            + "restore it with pg_restore");

    private long Scalar(string sql)
    {
        using var command = Command(sql);
        return (long)command.ExecuteScalar()!;
    }
}
