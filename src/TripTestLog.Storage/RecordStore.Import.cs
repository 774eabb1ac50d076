using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using System.Globalization;
using Microsoft.Data.Sqlite;
using TripTestLog.Domain.Devices;
using TripTestLog.Application.Records;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    /// <summary>How long an import waits for another process's import to finish before giving up.</summary>
    private static readonly TimeSpan LockPatience = TimeSpan.FromMinutes(10);

    /// <summary>Stores one parsed file with the strict defaults; see <see cref="Import(ParsedFile, DateTimeOffset, ImportOptions)"/>.</summary>
    public ImportOutcome Import(ParsedFile file, DateTimeOffset now) => Import(file, now, ImportOptions.Strict);

    /// <summary>
    /// Stores one parsed file in a single transaction. By default a file with any problem stores nothing; with
    /// <see cref="ImportOptions.AcceptValid"/> its good rows are stored and the bad ones counted as refused. A file whose
    /// SHA-256 was imported before adds nothing; a row identical to a stored record is counted as a duplicate; a row that
    /// differs from the same line of an earlier import from the same path is a conflict unless <see cref="ImportOptions.Replace"/>.
    /// Waits for another process's import rather than failing.
    /// </summary>
    public ImportOutcome Import(ParsedFile file, DateTimeOffset now, ImportOptions options)
    {
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(options);
        if (file.IsUnreadable || file.Kind is null || (file.Problems.Count > 0 && !options.AcceptValid))
        {
            return Refused(file, file.Problems);
        }

        using var transaction = BeginWriting();
        if (AlreadyImported(transaction, file.Sha256))
        {
            return new ImportOutcome(file.Path, file.Kind, ImportStatus.AlreadyImported, file.RowsRead, 0, 0, 0, []);
        }

        var problems = new List<RowProblem>(file.Problems);
        if (file.Kind == RecordKind.DeviceRegister && ConflictingRegisterRows(file) is { Count: > 0 } conflicts)
        {
            // Two different entries for one device and date cannot be sorted out row by row.
            return Refused(file, [.. problems, .. conflicts]);
        }

        var outcome = file.Kind switch
        {
            RecordKind.TripTests or RecordKind.ContactResistance or RecordKind.InsulationResistance => StoreMeasurements(transaction, file, now, options, problems),
            _ => StoreOther(transaction, file, now),
        };
        if (outcome.Status == ImportStatus.Refused)
        {
            return outcome;
        }

        transaction.Commit();
        return outcome with { Problems = problems, RefusedRows = RefusedLines(file, problems) };
    }

    private ImportOutcome StoreMeasurements(SqliteTransaction transaction, ParsedFile file, DateTimeOffset now, ImportOptions options, List<RowProblem> problems)
    {
        var deviceIds = DeviceIds(transaction);
        problems.AddRange(UnknownTags(file, deviceIds));
        var excluded = problems.Select(p => p.Line).ToHashSet();
        var (table, rows) = MeasurementTable.Of(file, deviceIds, excluded);
        var corrections = Corrections(transaction, file, table, rows);
        if (corrections.Count > 0 && !options.Replace)
        {
            problems.AddRange(corrections.Select(c => c.Problem(file.Path)));
            excluded.UnionWith(corrections.Select(c => c.New.Line));
            rows = rows.Where(r => !excluded.Contains(r.Line)).ToList();
        }

        if (problems.Count > 0 && !options.AcceptValid)
        {
            return Refused(file, problems);
        }

        var sourceId = InsertSourceFile(transaction, file, now);
        var replaced = 0L;
        if (options.Replace)
        {
            replaced = ApplyCorrections(transaction, table, corrections, sourceId, now);
            var corrected = corrections.Select(c => c.New.Line).ToHashSet();
            rows = rows.Where(r => !corrected.Contains(r.Line)).ToList();
        }

        var added = InsertMeasurements(transaction, table, rows, sourceId);
        var duplicates = rows.Count - added;
        RecordCounts(transaction, sourceId, added + replaced, duplicates);
        return new ImportOutcome(file.Path, file.Kind, ImportStatus.Imported, file.RowsRead, added, 0, duplicates, []) { Replaced = replaced };
    }

    private ImportOutcome StoreOther(SqliteTransaction transaction, ParsedFile file, DateTimeOffset now)
    {
        var sourceId = InsertSourceFile(transaction, file, now);
        var (added, updated, duplicates) = file.Kind switch
        {
            RecordKind.DeviceRegister => ImportRegister(transaction, file, sourceId, now),
            RecordKind.CurveTable => (InsertCurveTableRows(transaction, file, sourceId), 0, 0),
            RecordKind.AmbientTable => (InsertAmbientTableRows(transaction, file, sourceId), 0, 0),
            _ => InsertInstruments(transaction, file, sourceId),
        };
        RecordCounts(transaction, sourceId, added, duplicates);
        return new ImportOutcome(file.Path, file.Kind, ImportStatus.Imported, file.RowsRead, added, updated, duplicates, []);
    }

    /// <summary>
    /// BEGIN IMMEDIATE takes the write lock up front, so two imports queue instead of failing halfway. SQLite's own busy
    /// wait covers short waits; this loop covers another process's long import.
    /// </summary>
    private SqliteTransaction BeginWriting()
    {
        var started = DateTime.UtcNow;
        var pause = TimeSpan.FromMilliseconds(50);
        while (true)
        {
            try
            {
                return _connection.BeginTransaction(deferred: false);
            }
            catch (SqliteException e) when (e.SqliteErrorCode is 5 or 6 && DateTime.UtcNow - started < LockPatience)
            {
                Thread.Sleep(pause);
                pause = TimeSpan.FromMilliseconds(Math.Min(pause.TotalMilliseconds * 2, 2000));
            }
        }
    }

    private bool AlreadyImported(SqliteTransaction transaction, string sha)
    {
        using var select = Command(transaction, "SELECT COUNT(*) FROM source_files WHERE sha256 = $sha");
        select.Parameters.AddWithValue("$sha", sha);
        return (long)select.ExecuteScalar()! > 0;
    }

    private static long RefusedLines(ParsedFile file, IReadOnlyList<RowProblem> problems) =>
        problems.Where(p => p.Line > 1).Select(p => p.Line).Distinct().LongCount();

    private void RecordCounts(SqliteTransaction transaction, long sourceId, long added, long duplicates)
    {
        using var update = Command(transaction, "UPDATE source_files SET records_added = $a, duplicates = $d WHERE id = $id");
        update.Parameters.AddWithValue("$a", added);
        update.Parameters.AddWithValue("$d", duplicates);
        update.Parameters.AddWithValue("$id", sourceId);
        update.ExecuteNonQuery();
    }

    private static ImportOutcome Refused(ParsedFile file, IReadOnlyList<RowProblem> problems) =>
        new(file.Path, file.Kind, ImportStatus.Refused, file.RowsRead, 0, 0, 0, problems) { RefusedRows = file.RowsRead };

    private Dictionary<string, long> DeviceIds(SqliteTransaction transaction)
    {
        using var select = Command(transaction, "SELECT asset_tag, id FROM devices");
        using var reader = select.ExecuteReader();
        var ids = new Dictionary<string, long>(StringComparer.Ordinal);
        while (reader.Read())
        {
            ids[reader.GetString(0)] = reader.GetInt64(1);
        }

        return ids;
    }

    private static List<RowProblem> UnknownTags(ParsedFile file, Dictionary<string, long> known)
    {
        IEnumerable<(AssetTag Tag, long Line)> tags = file.Kind switch
        {
            RecordKind.TripTests => file.Trips.Select(t => (t.Record.Tag, t.Line)),
            RecordKind.ContactResistance => file.Contacts.Select(t => (t.Record.Tag, t.Line)),
            _ => file.Insulations.Select(t => (t.Record.Tag, t.Line)),
        };
        return tags
            .Where(t => !known.ContainsKey(t.Tag.Value))
            .Select(t => new RowProblem(file.Path, t.Line, "asset_tag",
                $"asset tag '{t.Tag}' is not in the device register; import a register that lists it first, or correct the tag"))
            .ToList();
    }

    private static List<RowProblem> ConflictingRegisterRows(ParsedFile file)
    {
        // Several entries for one device are its settings history, told apart by settings_from; two different entries
        // with the same date cannot both be right.
        var first = new Dictionary<(string, DateOnly?), Located<Device>>();
        var problems = new List<RowProblem>();
        foreach (var row in file.Devices)
        {
            var key = (row.Record.Tag.Value, row.Record.SettingsFrom);
            if (!first.TryAdd(key, row) && first[key].Record != row.Record)
            {
                problems.Add(new RowProblem(file.Path, row.Line, "asset_tag",
                    $"asset tag '{row.Record.Tag}' is already listed on line {first[key].Line} with other values and the same settings_from; "
                    + "keep one entry per device and date"));
            }
        }

        return problems;
    }

    private long InsertSourceFile(SqliteTransaction transaction, ParsedFile file, DateTimeOffset now)
    {
        using var insert = Command(transaction,
            "INSERT INTO source_files (file_name, sha256, kind, rows_read, records_added, duplicates, imported_at) "
            + "VALUES ($name, $sha, $kind, $rows, 0, 0, $at) RETURNING id");
        insert.Parameters.AddWithValue("$name", System.IO.Path.GetFullPath(file.Path));
        insert.Parameters.AddWithValue("$sha", file.Sha256);
        insert.Parameters.AddWithValue("$kind", file.Kind!.Value.ToString());
        insert.Parameters.AddWithValue("$rows", file.RowsRead);
        insert.Parameters.AddWithValue("$at", Utc(now));
        return (long)insert.ExecuteScalar()!;
    }

    private SqliteCommand Command(SqliteTransaction transaction, string sql)
    {
        var command = _connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        return command;
    }

    private static string Utc(DateTimeOffset at) => at.ToUniversalTime().ToString("yyyy-MM-ddTHH:mm:ssZ", CultureInfo.InvariantCulture);

    private static object Db(double? value) => value is { } v ? v : DBNull.Value;
}
