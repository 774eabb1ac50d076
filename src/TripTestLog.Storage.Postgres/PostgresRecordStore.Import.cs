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

    /// <summary>
    /// The server-wide lock every import's final write holds until it commits: the check for an earlier import of the
    /// same content and the write that follows it are one step, whichever machine runs them.
    /// </summary>
    /// <exception cref="TripTestLog.Application.Stores.StoreRefusedException">When another import holds it longer than the lab policy's wait.</exception>
    internal void TakeImportLock(NpgsqlTransaction transaction)
    {
        using var command = ServerCommand($"SELECT pg_try_advisory_xact_lock({ImportLock})", transaction);
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
}
