using TripTestLog.Application.Text;
using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using System.CommandLine;

namespace TripTestLog.Cli.Commands;

/// <summary>`backup PATH`: a consistent copy of a live database.</summary>
internal static class BackupCommand
{
    public static Command Create(CliContext cli)
    {
        var target = new Argument<FileInfo>("PATH") { Description = "The new file to write the copy to (must not exist)" };
        var db = CommonOptions.ExistingDatabase();
        var command = new Command("backup", "Write a consistent copy of a database file, safe while other imports run (SQLite online backup; a server database is backed up with pg_dump)")
        {
            target, db,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(target)!, parse.GetValue(db)!));
        return command;
    }

    private static int Run(CliContext cli, FileInfo target, StoreAddress db)
    {
        if (CommonOptions.Missing(cli, db))
        {
            return ExitCodes.BadInput;
        }

        if (target.Exists)
        {
            cli.Error.WriteLine($"error: {target.FullName} exists; choose a new file for the backup");
            return ExitCodes.BadInput;
        }

        if (target.Directory is { Exists: false } folder)
        {
            cli.Error.WriteLine($"error: the folder {folder.FullName} does not exist; create it or choose another path for the backup");
            return ExitCodes.BadInput;
        }

        using var store = Stores.Open(cli, db, StorePurpose.Read);
        store.Backup(target.FullName);
        var counts = store.Counts();
        Output.Wrapped.Write(cli.Out, $"Backed up {db.Display} to {target.FullName}: {Counted.Of(counts.Files, "file")}, {Counted.Of(counts.Devices, "device")}, "
            + $"{Counted.Of(counts.TripTests, "trip test")}, {counts.ContactTests} contact and {Counted.Of(counts.InsulationTests, "insulation reading")}.", 0, 2);
        return ExitCodes.Ok;
    }
}
