using TripTestLog.Application.Text;
using TripTestLog.Application.Stores;
using System.CommandLine;
using TripTestLog.Application.Transfer;
using TripTestLog.Cli.Services;

namespace TripTestLog.Cli.Commands;

/// <summary>`transfer --from DB --to DB`: copies a lab's database into another (a SQLite file into the server, or back).</summary>
internal static class TransferCommand
{
    public static Command Create(CliContext cli)
    {
        var from = CommonOptions.Store("--from", "The database to copy from (it must exist): a file, or a server postgres://user@host/dbname");
        var to = CommonOptions.Store("--to", "The database to copy into (created if missing): a file, or a server");
        var command = new Command("transfer",
            "Copy every imported file's records, register history and corrections from one database into another; files already there are skipped, so running it again adds nothing")
        {
            from, to,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(from)!, parse.GetValue(to)!));
        return command;
    }

    private static int Run(CliContext cli, StoreAddress from, StoreAddress to)
    {
        if (CommonOptions.Missing(cli, from))
        {
            return ExitCodes.BadInput;
        }

        if (string.Equals(from.Display, to.Display, StringComparison.Ordinal))
        {
            cli.Error.WriteLine($"error: --from and --to both name {from.Display}; give two different databases");
            return ExitCodes.BadInput;
        }

        using var source = Stores.Open(cli, from, StorePurpose.Read);
        using var target = Stores.Open(cli, to, StorePurpose.Import);
        var toCopy = source.Files().ToList();
        using var log = Logging.BesideDatabase(to);
        IReadOnlyList<TransferredFile> files;
        long changes;
        using (var progress = Progress.For(cli, toCopy.Count))
        {
            (files, changes) = new TransferPipeline(source, target).Run(toCopy, f =>
            {
                progress.Step(f.File.Name);
                log.Information("Transfer {From} -> {To}: {File} ({Sha}) {State}, {Added} of {Records} records added",
                    from.Display, to.Display, f.File.Name, f.File.Sha256, f.Copied ? "copied" : "already there", f.Added, f.Records);
            });
        }

        var copied = files.Count(f => f.Copied);
        if (copied > 0)
        {
            // A SQLite copy keeps its devices' peer places as an import does, so one device's findings are quick there too.
            PeerPlaces.Keep(cli, target, to, log);
        }

        cli.Out.WriteLine($"Transferred {from.Display}");
        cli.Out.WriteLine($"       into {to.Display}:");
        Output.Wrapped.Write(cli.Out, $"{Counted.Of(files.Count, "file")}: {copied} copied, {files.Count - copied} already there; "
            + $"{Counted.Of(files.Sum(f => f.Added), "record")} added; {Counted.Of(changes, "correction")} copied.", 2, 4);
        var counts = target.Counts();
        Output.Wrapped.Write(cli.Out, $"{to.Display} now holds {Counted.Of(counts.Files, "file")}, {Counted.Of(counts.Devices, "device")}, {Counted.Of(counts.TripTests, "trip test")}, "
            + $"{counts.ContactTests} contact and {Counted.Of(counts.InsulationTests, "insulation reading")}.", 2, 4);
        return ExitCodes.Ok;
    }
}
