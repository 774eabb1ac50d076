using System.Data.Common;
using System.Globalization;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage;

/// <summary>
/// A file small enough to hold whole (a register, a curve or ambient table, an instrument register) is stored in one
/// write transaction; measurement files stream through the database's own batch.
/// </summary>
public abstract partial class RelationalStore
{
    /// <summary>Stores a register, table or instrument file in one transaction, or says which file already brought the same content.</summary>
    public ImportOutcome StoreSmallFile(ParsedFile file, DateTimeOffset now)
    {
        ArgumentNullException.ThrowIfNull(file);
        using var transaction = BeginWrite();
        if (AlreadyImported(transaction, file.Sha256) is { } earlier)
        {
            return new ImportOutcome(file.Path, file.Kind, ImportStatus.AlreadyImported, file.RowsRead, 0, 0, 0, []) { EarlierFile = earlier };
        }

        var sourceId = InsertSourceFile(transaction, file.Path, file.FullPath, file.Sha256, file.Kind!.Value, file.RowsRead, now);
        var (added, updated, duplicates) = file.Kind switch
        {
            RecordKind.DeviceRegister => ImportRegister(transaction, file, sourceId, now),
            RecordKind.CurveTable => (InsertCurveTableRows(transaction, file, sourceId), 0, 0),
            RecordKind.AmbientTable => (InsertAmbientTableRows(transaction, file, sourceId), 0, 0),
            _ => InsertInstruments(transaction, file, sourceId),
        };
        RecordCounts(transaction, sourceId, file.RowsRead, added, duplicates, null);
        transaction.Commit();
        return new ImportOutcome(file.Path, file.Kind, ImportStatus.Imported, file.RowsRead, added, updated, duplicates, []);
    }

    /// <summary>The name the file with <paramref name="sha"/> was first imported under, or null when it was not.</summary>
    internal string? AlreadyImported(DbTransaction transaction, string sha)
    {
        using var select = Command($"SELECT file_name FROM source_files WHERE sha256 = {Dialect.P("sha")} ORDER BY id LIMIT 1", transaction);
        Dialect.Set(select, "sha", sha);
        return select.ExecuteScalar() as string;
    }

    /// <summary>Records an imported file (with counts of zero until <see cref="RecordCounts"/>) and returns its id.</summary>
    internal long InsertSourceFile(DbTransaction transaction, string name, string path, string sha, RecordKind kind, long rows, DateTimeOffset now)
    {
        using var insert = Command(
            "INSERT INTO source_files (file_name, full_path, sha256, kind, rows_read, records_added, duplicates, imported_at) "
            + $"VALUES ({Dialect.P("name")}, {Dialect.P("full")}, {Dialect.P("sha")}, {Dialect.P("kind")}, {Dialect.P("rows")}, 0, 0, {Dialect.P("at")}) RETURNING id",
            transaction);
        Dialect.Set(insert, "name", name);
        Dialect.Set(insert, "full", System.IO.Path.GetFullPath(path));
        Dialect.Set(insert, "sha", sha);
        Dialect.Set(insert, "kind", RecordKindCodes.Book.Of(kind));
        Dialect.Set(insert, "rows", rows);
        Dialect.Set(insert, "at", Dialect.Moment(now));
        return Convert.ToInt64(insert.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    /// <summary>Records a file's counts, and its real hash when it was stored under a placeholder.</summary>
    internal void RecordCounts(DbTransaction transaction, long sourceId, long rows, long added, long duplicates, string? sha)
    {
        using var update = Command(
            $"UPDATE source_files SET rows_read = {Dialect.P("rows")}, records_added = {Dialect.P("a")}, duplicates = {Dialect.P("d")}, "
            + $"sha256 = COALESCE({Dialect.P("sha")}, sha256) WHERE id = {Dialect.P("id")}", transaction);
        Dialect.Set(update, "rows", rows);
        Dialect.Set(update, "a", added);
        Dialect.Set(update, "d", duplicates);
        Dialect.SetText(update, "sha", sha);
        Dialect.Set(update, "id", sourceId);
        update.ExecuteNonQuery();
    }

    /// <summary>Every device's id by asset tag (compared as <see cref="AssetTag.Comparer"/> does).</summary>
    internal Dictionary<string, long> DeviceIds(DbTransaction transaction)
    {
        using var select = Command("SELECT asset_tag, id FROM devices", transaction);
        using var reader = select.ExecuteReader();
        var ids = new Dictionary<string, long>(AssetTag.Comparer);
        while (reader.Read())
        {
            ids[reader.GetString(0)] = reader.GetInt64(1);
        }

        return ids;
    }

    private long InsertCurveTableRows(DbTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(
            "INSERT INTO curve_table_rows (table_name, multiple, min_s, max_s, source_file_id, source_line) "
            + $"VALUES ({Dialect.P("n")}, {Dialect.P("m")}, {Dialect.P("min")}, {Dialect.P("max")}, {Dialect.P("src")}, {Dialect.P("line")})", transaction);
        foreach (var (row, line) in file.CurveTableRows)
        {
            Dialect.Set(insert, "n", row.Table);
            Dialect.SetNumber(insert, "m", row.Point.Multiple.Value);
            Dialect.SetNumber(insert, "min", row.Point.Minimum.Value);
            Dialect.SetNumber(insert, "max", row.Point.Maximum?.Value);
            Dialect.Set(insert, "src", sourceId);
            Dialect.Set(insert, "line", line);
            insert.ExecuteNonQuery();
        }

        return file.CurveTableRows.Count;
    }

    private long InsertAmbientTableRows(DbTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(
            "INSERT INTO ambient_table_rows (table_name, ambient_c, current_factor, source_file_id, source_line) "
            + $"VALUES ({Dialect.P("n")}, {Dialect.P("t")}, {Dialect.P("f")}, {Dialect.P("src")}, {Dialect.P("line")})", transaction);
        foreach (var (row, line) in file.AmbientTableRows)
        {
            Dialect.Set(insert, "n", row.Table);
            Dialect.SetNumber(insert, "t", row.Point.Ambient.Value);
            Dialect.SetNumber(insert, "f", row.Point.CurrentFactor);
            Dialect.Set(insert, "src", sourceId);
            Dialect.Set(insert, "line", line);
            insert.ExecuteNonQuery();
        }

        return file.AmbientTableRows.Count;
    }

    // A calibration already stored (the same fingerprint) is a duplicate, not an error.
    private (long Added, long Updated, long Duplicates) InsertInstruments(DbTransaction transaction, ParsedFile file, long sourceId)
    {
        var accuracyNames = Enumerable.Range(0, InstrumentAccuracyColumns.Names.Length).Select(i => "a" + i).ToArray();
        using var insert = Command(
            $"INSERT INTO instruments (instrument, kind, serial, calibrated_on, calibration_due, source_file_id, source_line, fingerprint, {InstrumentAccuracyColumns.List}) "
            + $"VALUES ({string.Join(", ", new[] { "i", "k", "s", "on", "due", "src", "line", "fp" }.Concat(accuracyNames).Select(Dialect.P))}) "
            + "ON CONFLICT (fingerprint) DO NOTHING", transaction);
        long added = 0;
        foreach (var (c, line) in file.Instruments)
        {
            Dialect.Set(insert, "i", c.Instrument);
            Dialect.Set(insert, "k", c.Kind);
            Dialect.Set(insert, "s", c.Serial);
            Dialect.Set(insert, "on", Dialect.Date(c.CalibratedOn));
            Dialect.Set(insert, "due", Dialect.Date(c.CalibrationDue));
            Dialect.Set(insert, "src", sourceId);
            Dialect.Set(insert, "line", line);
            Dialect.Set(insert, "fp", Dialect.FingerprintValue(Fingerprint.Of(c)));
            var accuracy = InstrumentAccuracyColumns.Values(c.Accuracy);
            for (var i = 0; i < accuracy.Length; i++)
            {
                Dialect.SetNumber(insert, accuracyNames[i], accuracy[i] is double v ? v : (double?)null);
            }

            added += insert.ExecuteNonQuery();
        }

        return (added, 0, file.Instruments.Count - added);
    }
}
