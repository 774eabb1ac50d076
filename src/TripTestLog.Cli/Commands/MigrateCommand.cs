using System.CommandLine;
using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;

namespace TripTestLog.Cli.Commands;

/// <summary>`migrate`: brings an existing database's schema up to this version's; the only step besides import that changes it.</summary>
internal static class MigrateCommand
{
    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.ExistingDatabase();
        var command = new Command("migrate", "Bring an existing database's schema up to this version (reading commands never change it; import does this too). "
            + "On a server, run it as the owner role")
        {
            db,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(db)!));
        return command;
    }

    private static int Run(CliContext cli, StoreAddress db)
    {
        if (CommonOptions.Missing(cli, db))
        {
            return ExitCodes.BadInput;
        }

        using var store = Stores.Open(cli, db, StorePurpose.Migrate);
        using (var log = Logging.BesideDatabase(db))
        {
            // A database upgraded from before peer positions were kept gets them now, not at its next import.
            PeerPlaces.Keep(cli, store, db, log);
        }

        var applied = Stores.AppliedMigrations(store);
        Output.Wrapped.Write(cli.Out, $"The schema of {db.Display} is up to date: {applied.Count} migrations, the latest {(applied.Count > 0 ? applied[^1] : "none")}.", 0);
        return ExitCodes.Ok;
    }
}
