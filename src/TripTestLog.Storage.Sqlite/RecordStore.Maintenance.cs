using TripTestLog.Application.Stores;
using System.Globalization;

using TripTestLog.Storage.Entities;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
    private static readonly string[] RecordTables = ["devices", "device_revisions", "trip_tests", "contact_tests", "insulation_tests", "curve_table_rows", "ambient_table_rows", "instruments"];

    /// <summary>Every instrument calibration period imported.</summary>
    public InstrumentRegister Instruments() => new(Rows(
        $"SELECT instrument, kind, serial, calibrated_on, calibration_due, {InstrumentAccuracyColumns.List} FROM instruments ORDER BY id",
        r => new InstrumentCalibration(r.GetString(0), r.GetString(1), r.GetString(2), Date(r.GetString(3)), Date(r.GetString(4)))
        {
            Accuracy = InstrumentAccuracyColumns.Read(r, 5),
        }));

    /// <summary>Every value a corrected file replaced, oldest first: table, record id, column, old value, new value.</summary>
    public IReadOnlyList<(string Table, long RecordId, string Column, string Old, string New)> AuditTrail() =>
        Rows("SELECT table_name, record_id, column_name, old_value, new_value FROM audit_changes ORDER BY id",
            r => (r.GetString(0), r.GetInt64(1), r.GetString(2), r.GetString(3), r.GetString(4)));

    /// <summary>
    /// SQLite's integrity and foreign-key checks, then the project's own: every record traces to an imported file, and
    /// every imported file still at its recorded path has the hash it had when imported.
    /// </summary>
    public VerifyReport Verify()
    {
        var integrity = Lines("PRAGMA integrity_check").Where(l => l != "ok").ToList();
        var foreignKeys = Lines("PRAGMA foreign_key_check").LongCount();
        long untraced = 0;
        foreach (var table in RecordTables)
        {
            untraced += Scalar($"SELECT COUNT(*) FROM {table} t WHERE NOT EXISTS (SELECT 1 FROM source_files f WHERE f.id = t.source_file_id)");
        }

        // Per file, the records it brought: a register's entries are its revisions (a devices row is a copy of the newest).
        var counts = new Dictionary<long, long>();
        foreach (var table in RecordTables.Where(t => t != "devices"))
        {
            using var count = _connection.CreateCommand();
            count.CommandText = $"SELECT source_file_id, COUNT(*) FROM {table} GROUP BY source_file_id";
            using var reader = count.ExecuteReader();
            while (reader.Read())
            {
                counts[reader.GetInt64(0)] = counts.GetValueOrDefault(reader.GetInt64(0)) + reader.GetInt64(1);
            }
        }

        var fingerprints = new FingerprintCheck();
        foreach (var table in FingerprintCheck.Tables)
        {
            using var select = _connection.CreateCommand();
            select.CommandText = $"SELECT {string.Join(", ", table.Columns.Select(c => "t." + c))}, t.fingerprint, f.file_name, t.source_line "
                + $"FROM {table.Table} t LEFT JOIN source_files f ON f.id = t.source_file_id";
            using var reader = select.ExecuteReader();
            var n = table.Columns.Length;
            while (reader.Read())
            {
                var values = Enumerable.Range(0, n).Select(reader.GetValue).ToArray();
                fingerprints.Check(table, values, reader.GetString(n), reader.IsDBNull(n + 1) ? null : reader.GetString(n + 1), reader.GetInt64(n + 2));
            }
        }

        var files = ImportedFiles.Check(Rows("SELECT id, file_name, full_path, sha256 FROM source_files ORDER BY id",
            r => new SourceFileRow { Id = r.GetInt64(0), FileName = r.GetString(1), FullPath = r.GetString(2), Sha256 = r.GetString(3) }), counts);
        return new VerifyReport(integrity, foreignKeys, untraced, files) { AlteredRecords = fingerprints.Altered, AlteredExamples = fingerprints.ExamplesFound };
    }

    /// <summary>A consistent copy of the live database at <paramref name="destination"/>, made with SQLite's online backup.</summary>
    /// <exception cref="IOException">When the destination exists.</exception>
    public void Backup(string destination)
    {
        if (File.Exists(destination))
        {
            throw new IOException($"{destination} exists; choose a new file for the backup");
        }

        using var target = StoreOptions.Connect(destination);
        target.Open();
        _connection.BackupDatabase(target);
    }

    private List<string> Lines(string sql)
    {
        using var command = _connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var lines = new List<string>();
        while (reader.Read())
        {
            lines.Add(Convert.ToString(reader.GetValue(0), CultureInfo.InvariantCulture) ?? "");
        }

        return lines;
    }

    private long Scalar(string sql)
    {
        using var command = _connection.CreateCommand();
        command.CommandText = sql;
        return (long)command.ExecuteScalar()!;
    }

    private static DateOnly Date(string text) => DateOnly.ParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture);

}
