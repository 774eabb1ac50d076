using System.CommandLine;
using TripTestLog.Cli.Output;
using TripTestLog.Cli.Services;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Commands;

/// <summary>`import PATH...`: reads record files and folders into the database, each file whole or not at all.</summary>
internal static class ImportCommand
{
    public static Command Create(CliContext cli)
    {
        var paths = new Argument<string[]>("PATH")
        {
            Description = "CSV files, or folders to search for *.csv; the kind of each file is recognised from its header",
            Arity = ArgumentArity.OneOrMore,
        };
        var db = CommonOptions.Database();
        var command = new Command("import", "Import record files; a file with any bad row is refused whole and the summary says where and why")
        {
            paths, db,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(paths)!, parse.GetValue(db)!));
        return command;
    }

    private static int Run(CliContext cli, string[] paths, FileInfo db)
    {
        var (files, missing) = ImportRunner.Expand(paths);
        if (missing.Count > 0)
        {
            foreach (var path in missing)
            {
                cli.Error.WriteLine($"error: {path}: no such file or folder");
            }

            return ExitCodes.BadInput;
        }

        if (files.Count == 0)
        {
            cli.Error.WriteLine("error: no .csv files found in the paths given");
            return ExitCodes.BadInput;
        }

        using var log = Logging.BesideDatabase(db);
        using var store = RecordStore.Open(db.FullName);
        var outcomes = new ImportRunner(store, log, cli).Run(files);
        ImportReport.Write(cli.Out, outcomes, LogPath(db));
        return outcomes.Any(o => o.Status == ImportStatus.Refused) ? ExitCodes.BadInput : ExitCodes.Ok;
    }

    public static string LogPath(FileInfo db) => Path.Combine(db.Directory?.FullName ?? ".", "triptestlog.log");
}
