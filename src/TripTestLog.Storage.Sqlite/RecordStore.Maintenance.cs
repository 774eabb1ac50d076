using TripTestLog.Application.Stores;
using System.Globalization;

using TripTestLog.Storage.Entities;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Storage.Sqlite;

public sealed partial class RecordStore
{
    /// <summary>Every value a corrected file replaced, oldest first: table, record id, column, old value, new value.</summary>
    public IReadOnlyList<(string Table, long RecordId, string Column, string Old, string New)> AuditTrail() =>
        Rows("SELECT table_name, record_id, column_name, old_value, new_value FROM audit_changes ORDER BY id",
            r => (r.GetString(0), r.GetInt64(1), r.GetString(2), r.GetString(3), r.GetString(4)));

    /// <summary>SQLite's integrity check and its foreign-key check.</summary>
    protected override (IReadOnlyList<string>? Integrity, long BrokenReferences) DatabaseChecks() =>
        (Lines("PRAGMA integrity_check").Where(l => l != "ok").ToList(), Lines("PRAGMA foreign_key_check").LongCount());

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
}
