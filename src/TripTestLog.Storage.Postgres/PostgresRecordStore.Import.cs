using Npgsql;
using NpgsqlTypes;
using TripTestLog.Application.Import;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage.Postgres;

public sealed partial class PostgresRecordStore
{
    /// <inheritdoc />
    public IMeasurementBatch BeginMeasurements(RecordKind kind, string name, string path, DateTimeOffset now, string? corrects = null) =>
        new ServerMeasurementBatch(this, kind, name, path, now, corrects);

    /// <inheritdoc />
    public ImportOutcome StoreSmallFile(ParsedFile file, DateTimeOffset now)
    {
        ArgumentNullException.ThrowIfNull(file);
        using var transaction = _connection.BeginTransaction();
        TakeImportLock(transaction);
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

    /// <summary>
    /// The server-wide lock every import's final write holds until it commits: the check for an earlier import of the
    /// same content and the write that follows it are one step, whichever machine runs them.
    /// </summary>
    /// <exception cref="TripTestLog.Application.Stores.StoreRefusedException">When another import holds it longer than the lab policy's wait.</exception>
    internal void TakeImportLock(NpgsqlTransaction transaction)
    {
        using var command = Command($"SELECT pg_try_advisory_xact_lock({ImportLock})", transaction);
        var started = DateTime.UtcNow;
        var said = false;
        while (!(bool)command.ExecuteScalar()!)
        {
            if (DateTime.UtcNow - started >= Opening.Patience)
            {
                throw new TripTestLog.Application.Stores.StoreRefusedException($"another import on {Location} held the server's import lock longer than "
                    + $"{Opening.PatienceText}, so nothing of this file was stored; import it again later, or raise store_wait_minutes in the lab policy");
            }

            if (!said)
            {
                Opening.Note($"waiting for another import on {Location} to finish its final write (up to {Opening.PatienceText}, lab policy store_wait_minutes)");
                said = true;
            }

            Thread.Sleep(200);
        }
    }

    /// <summary>The name the file with <paramref name="sha"/> was first imported under, or null when it was not.</summary>
    internal string? AlreadyImported(NpgsqlTransaction transaction, string sha)
    {
        using var select = Command("SELECT file_name FROM source_files WHERE sha256 = @sha ORDER BY id LIMIT 1", transaction);
        select.Parameters.Add(Text("sha", sha));
        return select.ExecuteScalar() as string;
    }

    internal long InsertSourceFile(NpgsqlTransaction transaction, string name, string path, string sha, RecordKind kind, long rows, DateTimeOffset now)
    {
        using var insert = Command(
            "INSERT INTO source_files (file_name, full_path, sha256, kind, rows_read, records_added, duplicates, imported_at) "
            + "VALUES (@name, @full, @sha, @kind, @rows, 0, 0, @at) RETURNING id", transaction);
        insert.Parameters.Add(Text("name", name));
        insert.Parameters.Add(Text("full", Path.GetFullPath(path)));
        insert.Parameters.Add(Text("sha", sha));
        insert.Parameters.Add(Text("kind", kind.ToString()));
        insert.Parameters.Add(new NpgsqlParameter("rows", NpgsqlDbType.Bigint) { Value = rows });
        insert.Parameters.Add(new NpgsqlParameter("at", NpgsqlDbType.TimestampTz) { Value = now.ToUniversalTime() });
        return (long)insert.ExecuteScalar()!;
    }

    /// <summary>Records a file's counts, and its real hash when it was stored under a placeholder.</summary>
    internal void RecordCounts(NpgsqlTransaction transaction, long sourceId, long rows, long added, long duplicates, string? sha)
    {
        using var update = Command(
            "UPDATE source_files SET rows_read = @rows, records_added = @a, duplicates = @d, sha256 = COALESCE(@sha, sha256) WHERE id = @id", transaction);
        update.Parameters.Add(new NpgsqlParameter("rows", NpgsqlDbType.Bigint) { Value = rows });
        update.Parameters.Add(new NpgsqlParameter("a", NpgsqlDbType.Bigint) { Value = added });
        update.Parameters.Add(new NpgsqlParameter("d", NpgsqlDbType.Bigint) { Value = duplicates });
        update.Parameters.Add(Text("sha", sha));
        update.Parameters.Add(new NpgsqlParameter("id", NpgsqlDbType.Bigint) { Value = sourceId });
        update.ExecuteNonQuery();
    }

    internal Dictionary<string, long> DeviceIds(NpgsqlTransaction transaction)
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

    private long InsertCurveTableRows(NpgsqlTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(
            "INSERT INTO curve_table_rows (table_name, multiple, min_s, max_s, source_file_id, source_line) VALUES (@n, @m, @min, @max, @src, @line)", transaction);
        var p = Parameters(insert, ("n", NpgsqlDbType.Text), ("m", NpgsqlDbType.Double), ("min", NpgsqlDbType.Double), ("max", NpgsqlDbType.Double),
            ("src", NpgsqlDbType.Bigint), ("line", NpgsqlDbType.Bigint));
        foreach (var (row, line) in file.CurveTableRows)
        {
            p[0].Value = row.Table;
            p[1].Value = row.Point.Multiple.Value;
            p[2].Value = row.Point.Minimum.Value;
            p[3].Value = row.Point.Maximum is { } max ? max.Value : DBNull.Value;
            p[4].Value = sourceId;
            p[5].Value = line;
            insert.ExecuteNonQuery();
        }

        return file.CurveTableRows.Count;
    }

    private long InsertAmbientTableRows(NpgsqlTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(
            "INSERT INTO ambient_table_rows (table_name, ambient_c, current_factor, source_file_id, source_line) VALUES (@n, @t, @f, @src, @line)", transaction);
        var p = Parameters(insert, ("n", NpgsqlDbType.Text), ("t", NpgsqlDbType.Double), ("f", NpgsqlDbType.Double), ("src", NpgsqlDbType.Bigint), ("line", NpgsqlDbType.Bigint));
        foreach (var (row, line) in file.AmbientTableRows)
        {
            p[0].Value = row.Table;
            p[1].Value = row.Point.Ambient.Value;
            p[2].Value = row.Point.CurrentFactor;
            p[3].Value = sourceId;
            p[4].Value = line;
            insert.ExecuteNonQuery();
        }

        return file.AmbientTableRows.Count;
    }

    private (long Added, long Updated, long Duplicates) InsertInstruments(NpgsqlTransaction transaction, ParsedFile file, long sourceId)
    {
        using var insert = Command(
            "INSERT INTO instruments (instrument, kind, serial, calibrated_on, calibration_due, source_file_id, source_line, fingerprint, "
            + InstrumentAccuracyColumns.List + ") VALUES (@i, @k, @s, @on, @due, @src, @line, @fp, @a0, @a1, @a2, @a3, @a4, @a5, @a6, @a7) "
            + "ON CONFLICT (fingerprint) DO NOTHING", transaction);
        var p = Parameters(insert, [("i", NpgsqlDbType.Text), ("k", NpgsqlDbType.Text), ("s", NpgsqlDbType.Text), ("on", NpgsqlDbType.Date),
            ("due", NpgsqlDbType.Date), ("src", NpgsqlDbType.Bigint), ("line", NpgsqlDbType.Bigint), ("fp", NpgsqlDbType.Bytea),
            .. Enumerable.Range(0, InstrumentAccuracyColumns.Names.Length).Select(i => ("a" + i, NpgsqlDbType.Double))]);
        long added = 0;
        foreach (var (c, line) in file.Instruments)
        {
            p[0].Value = c.Instrument;
            p[1].Value = c.Kind;
            p[2].Value = c.Serial;
            p[3].Value = c.CalibratedOn;
            p[4].Value = c.CalibrationDue;
            p[5].Value = sourceId;
            p[6].Value = line;
            p[7].Value = Convert.FromHexString(Fingerprint.Of(c));
            var accuracy = InstrumentAccuracyColumns.Values(c.Accuracy);
            for (var i = 0; i < accuracy.Length; i++)
            {
                p[8 + i].Value = accuracy[i];
            }

            added += insert.ExecuteNonQuery();
        }

        return (added, 0, file.Instruments.Count - added);
    }

    internal static NpgsqlParameter[] Parameters(NpgsqlCommand command, params (string Name, NpgsqlDbType Type)[] names)
    {
        var parameters = names.Select(n => new NpgsqlParameter(n.Name, n.Type) { Value = DBNull.Value }).ToArray();
        command.Parameters.AddRange(parameters);
        return parameters;
    }
}
