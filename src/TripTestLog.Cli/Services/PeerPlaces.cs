using TripTestLog.Application.Findings;
using TripTestLog.Application.Stores;
using TripTestLog.Cli.Output;

namespace TripTestLog.Cli.Services;

/// <summary>
/// Keeps each device's place among its peers up to date after anything that writes records (import, migrate,
/// transfer, demo), under the lab policy beside the database. The records are stored whatever happens here: a store
/// that cannot keep the places leaves one device's findings to work them out, with the same result.
/// </summary>
internal static class PeerPlaces
{
    public static void Keep(CliContext cli, IRecordStore store, StoreAddress db, Serilog.ILogger log)
    {
        if (store is not IPeerPositionStore positions)
        {
            return;
        }

        if (PolicyLoader.Load(null, db, out var problem) is not { } policy)
        {
            log.Warning("Peer positions not brought up to date: {Problem}", problem);
            return;
        }

        Progress? progress = null;
        try
        {
            // A first import, a migration or a policy change can mean every device: seconds at 10,000 devices.
            var devices = StoredPeerPositions.Refresh(store, positions, policy.Policy, cli.Cancel, total =>
            {
                progress ??= Progress.For(cli, total);
                progress.Step("places among peers");
            });
            log.Information("Peer positions brought up to date for {Devices} devices", devices);
        }
        catch (Exception e) when (e is not OperationCanceledException && Faults.IsTheUsers(e))
        {
            log.Warning(e, "Peer positions not brought up to date");
            cli.Error.WriteLine("note: the records are stored, but each device's place among its peers could not be kept ("
                + Visible.Text(e.Message) + "); one device's findings will work it out, more slowly");
        }
        finally
        {
            progress?.Dispose();
        }
    }
}
