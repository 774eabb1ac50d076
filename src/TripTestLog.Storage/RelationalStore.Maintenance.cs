using System.Data.Common;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Application.Stores;
using TripTestLog.Storage.Entities;

namespace TripTestLog.Storage;

public abstract partial class RelationalStore
{
    /// <summary>Every table whose rows cite the file they came from.</summary>
    protected static readonly string[] RecordTables =
        ["devices", "device_revisions", "trip_tests", "contact_tests", "insulation_tests", "curve_table_rows", "ambient_table_rows", "instruments"];

    /// <summary>
    /// The database's own checks: what its page-level check found wrong (null when the store leaves that check to the
    /// database's administrator), and how many references do not resolve.
    /// </summary>
    protected abstract (IReadOnlyList<string>? Integrity, long BrokenReferences) DatabaseChecks();

    /// <summary>
    /// The database's own checks, then the project's: every record traces to an imported file, every stored record
    /// still gives the fingerprint stored with it, and every imported file still at its recorded path (on this
    /// machine) has the hash it had when imported.
    /// </summary>
    public VerifyReport Verify()
    {
        ReadingMany();
        var (integrity, broken) = DatabaseChecks();
        long untraced = 0;
        foreach (var table in RecordTables)
        {
            untraced += Scalar($"SELECT COUNT(*) FROM {table} t WHERE NOT EXISTS (SELECT 1 FROM source_files f WHERE f.id = t.source_file_id)");
        }

        // Per file, the records it brought: a register's entries are its revisions (a devices row is a copy of the newest).
        var counts = new Dictionary<long, long>();
        foreach (var table in RecordTables.Where(t => t != "devices"))
        {
            foreach (var (id, n) in Rows($"SELECT source_file_id, COUNT(*) FROM {table} GROUP BY source_file_id", r => (r.GetInt64(0), r.GetInt64(1))))
            {
                counts[id] = counts.GetValueOrDefault(id) + n;
            }
        }

        var fingerprints = new FingerprintCheck();
        foreach (var table in FingerprintCheck.Tables)
        {
            var n = table.Columns.Length;
            using var select = Command(
                $"SELECT {string.Join(", ", table.Columns.Select(c => "t." + c))}, {Dialect.Text("t.fingerprint")}, f.file_name, t.source_line{Dialect.TestTimeColumns("t")} "
                + $"FROM {table.Table} t LEFT JOIN source_files f ON f.id = t.source_file_id");
            using var reader = select.ExecuteReader();
            while (reader.Read())
            {
                var values = Enumerable.Range(0, n).Select(reader.GetValue).ToArray();
                values[MeasurementTable.TestedAtColumn] = Dialect.TestedAtText(reader, MeasurementTable.TestedAtColumn);
                fingerprints.Check(table, values, reader.GetString(n), reader.IsDBNull(n + 1) ? null : reader.GetString(n + 1), reader.GetInt64(n + 2));
            }
        }

        var files = ImportedFiles.Check(Rows("SELECT id, file_name, full_path, sha256 FROM source_files ORDER BY id",
            r => new SourceFileRow { Id = r.GetInt64(0), FileName = r.GetString(1), FullPath = r.GetString(2), Sha256 = r.GetString(3) }), counts);
        var report = new VerifyReport(integrity ?? [], broken, untraced, files) { AlteredRecords = fingerprints.Altered, AlteredExamples = fingerprints.ExamplesFound };
        return integrity is null ? report with { IntegrityCheck = null } : report;
    }

    /// <summary>The measurement files of <paramref name="kind"/> stored so far: the candidates a correction may name.</summary>
    internal IEnumerable<EarlierFile> EarlierFiles(DbTransaction transaction, RecordKind kind)
    {
        using var select = Command(
            $"SELECT id, file_name, full_path, sha256, imported_at FROM source_files WHERE kind = {Dialect.P("kind")} AND sha256 NOT LIKE 'pending:%' ORDER BY id",
            transaction);
        Dialect.Set(select, "kind", RecordKindCodes.Book.Of(kind));
        using var reader = select.ExecuteReader();
        var files = new List<EarlierFile>();
        while (reader.Read())
        {
            files.Add(new EarlierFile(reader.GetInt64(0), reader.GetString(1), reader.GetString(2), reader.GetString(3), Dialect.Moment(reader, 4)));
        }

        return files;
    }
}
