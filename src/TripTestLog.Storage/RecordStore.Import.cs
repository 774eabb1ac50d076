using System.Globalization;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Records;

namespace TripTestLog.Storage;

public sealed partial class RecordStore
{
    /// <summary>
    /// Stores one parsed file in a single transaction: all of it, or, when the file has any problem, nothing.
    /// A file whose SHA-256 was imported before adds nothing; a row identical to a stored record is counted as a duplicate.
    /// </summary>
    public ImportOutcome Import(ParsedFile file, DateTimeOffset now)
    {
        ArgumentNullException.ThrowIfNull(file);
        if (file.Problems.Count > 0 || file.Kind is null)
        {
            return Refused(file, file.Problems);
        }

        if (_context.SourceFiles.AsNoTracking().Any(s => s.Sha256 == file.Sha256))
        {
            return new ImportOutcome(file.Path, file.Kind, ImportStatus.AlreadyImported, file.RowsRead, 0, 0, 0, []);
        }

        if (file.Kind == RecordKind.DeviceRegister && ConflictingRegisterRows(file) is { Count: > 0 } conflicts)
        {
            return Refused(file, conflicts);
        }

        var needsDevices = file.Kind is RecordKind.TripTests or RecordKind.ContactResistance or RecordKind.InsulationResistance;
        var deviceIds = needsDevices ? DeviceIds() : null;
        if (deviceIds is not null)
        {
            var unknown = UnknownTags(file, deviceIds);
            if (unknown.Count > 0)
            {
                return Refused(file, unknown);
            }
        }

        using var transaction = _connection.BeginTransaction();
        var sourceId = InsertSourceFile(transaction, file, now);
        var (added, updated, duplicates) = file.Kind switch
        {
            RecordKind.DeviceRegister => ImportRegister(transaction, file, sourceId, now),
            RecordKind.TripTests => (InsertTrips(transaction, file, sourceId, deviceIds!), 0, 0),
            RecordKind.ContactResistance => (InsertContacts(transaction, file, sourceId, deviceIds!), 0, 0),
            RecordKind.InsulationResistance => (InsertInsulations(transaction, file, sourceId, deviceIds!), 0, 0),
            RecordKind.CurveTable => (InsertCurveTableRows(transaction, file, sourceId), 0, 0),
            _ => (InsertAmbientTableRows(transaction, file, sourceId), 0, 0),
        };
        if (file.Kind != RecordKind.DeviceRegister)
        {
            duplicates = file.RecordCount - added;
        }

        using (var update = Command(transaction, "UPDATE source_files SET records_added = $a, duplicates = $d WHERE id = $id"))
        {
            update.Parameters.AddWithValue("$a", added);
            update.Parameters.AddWithValue("$d", duplicates);
            update.Parameters.AddWithValue("$id", sourceId);
            update.ExecuteNonQuery();
        }

        transaction.Commit();
        return new ImportOutcome(file.Path, file.Kind, ImportStatus.Imported, file.RowsRead, added, updated, duplicates, []);
    }

    private static ImportOutcome Refused(ParsedFile file, IReadOnlyList<RowProblem> problems) =>
        new(file.Path, file.Kind, ImportStatus.Refused, file.RowsRead, 0, 0, 0, problems);

    private Dictionary<string, long> DeviceIds() =>
        _context.Devices.AsNoTracking().Select(d => new { d.AssetTag, d.Id }).ToDictionary(d => d.AssetTag, d => d.Id, StringComparer.Ordinal);

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
        insert.Parameters.AddWithValue("$name", file.Path);
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

    private static object Db(string? value) => value is null ? DBNull.Value : value;
}
