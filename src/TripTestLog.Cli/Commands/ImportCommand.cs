using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using System.CommandLine;
using TripTestLog.Cli.Output;
using TripTestLog.Cli.Services;
using TripTestLog.Ingest;

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
        var acceptValid = new Option<bool>("--accept-valid")
        {
            Description = "Store the good rows of a file with bad rows; the bad rows go, unchanged and with their reasons, to NAME.rejects.csv beside it",
        };
        var replace = new Option<string?>("--replace")
        {
            Description = "The one PATH given corrects the earlier file named here (its name as imported, full path, or SHA-256 prefix): "
                + "its records take the new values line by line, old values kept in the audit table; without it, every file is a new file",
            HelpName = "EARLIER",
        };
        var profile = new Option<FileInfo?>("--profile") { Description = "A column-mapping profile (JSON) for another layout; applies to every file given", HelpName = "FILE" };
        var delimiter = new Option<string?>("--delimiter") { Description = "Field separator, e.g. ';' (default: recognised from the header)", HelpName = "CHAR" };
        var decimalMark = new Option<string?>("--decimal") { Description = "Decimal mark: '.' or ',' (default: '.' for comma files, ',' accepted in semicolon files)", HelpName = "CHAR" };
        var wide = new Option<bool>("--wide") { Description = "Show file names whole in the summary, however wide" };
        var asOf = new Option<string?>("--as-of") { Description = "Refuse records dated after this date (default: today)", HelpName = "YYYY-MM-DD" };
        var maxMb = new Option<int?>("--max-file-mb") { Description = "Refuse files larger than this (no limit by default: files stream through)", HelpName = "MB" };
        var command = new Command("import", "Import record files; a file with any bad row is refused whole (unless --accept-valid) and the summary says where and why")
        {
            paths, db, acceptValid, replace, profile, delimiter, decimalMark, maxMb, asOf, wide,
        };
        command.SetAction(parse =>
        {
            var today = cli.Today;
            if (!ConditionOptions.AsOfDate(parse.GetValue(asOf), today, cli, out today))
            {
                return ExitCodes.BadInput;
            }

            if (parse.GetValue(replace) is { } corrects && (parse.GetValue(paths)!.Length != 1 || !File.Exists(parse.GetValue(paths)![0]) || corrects.Trim().Length == 0))
            {
                cli.Error.WriteLine("error: --replace EARLIER corrects one file: give exactly one CSV file as PATH and name the earlier file it corrects");
                return ExitCodes.BadInput;
            }

            return Run(cli, parse.GetValue(paths)!, parse.GetValue(db)!, new ImportOptions(parse.GetValue(acceptValid), parse.GetValue(replace)),
                parse.GetValue(profile), parse.GetValue(delimiter), parse.GetValue(decimalMark), parse.GetValue(maxMb), today,
                parse.GetValue(wide) ? int.MaxValue : Wrapped.Width);
        });
        return command;
    }

    private static int Run(CliContext cli, string[] paths, StoreAddress db, ImportOptions options, FileInfo? profileFile, string? delimiter, string? decimalMark, int? maxMb,
        DateOnly today, int width)
    {
        if (delimiter is { Length: not 1 } || decimalMark is not (null or "." or ",") || maxMb is < 1 or > 100_000)
        {
            cli.Error.WriteLine("error: --delimiter takes one character, --decimal '.' or ',', --max-file-mb 1 to 100000");
            return ExitCodes.BadInput;
        }

        var read = new ReadOptions { Separator = delimiter?[0], Decimal = decimalMark?[0], MaxBytes = maxMb is { } mb ? mb * 1024L * 1024L : long.MaxValue };
        if (profileFile is not null)
        {
            var (profile, problem) = profileFile.Exists ? ColumnProfile.Load(profileFile.FullName) : (null, $"{profileFile.FullName}: no such file");
            if (profile is null)
            {
                cli.Error.WriteLine("error: --profile: " + problem);
                return ExitCodes.BadInput;
            }

            read = read with { Profile = profile };
        }

        var (files, problems, skipped) = ImportRunner.Expand(paths, read);
        if (problems.Count > 0)
        {
            foreach (var problem in problems)
            {
                cli.Error.WriteLine("error: " + problem);
            }

            return ExitCodes.BadInput;
        }

        if (files.Count == 0)
        {
            skipped.ForEach(entry => cli.Error.WriteLine("refused: " + Visible.Text(entry)));
            cli.Error.WriteLine("error: no .csv files found in the paths given");
            return ExitCodes.BadInput;
        }

        if (db.MissingFolder() is { } missing)
        {
            cli.Error.WriteLine("error: " + missing);
            return ExitCodes.BadInput;
        }

        using var log = Logging.BesideDatabase(db);
        using var store = Stores.Open(cli, db, StorePurpose.Import);
        IReadOnlyList<ImportOutcome> outcomes;
        var runner = new ImportRunner(store, log, cli);
        try
        {
            outcomes = runner.Run(files, options, today);
        }
        catch (OperationCanceledException)
        {
            log.Warning("Import stopped by the user");
            cli.Error.WriteLine("import stopped: the file in progress was rolled back; the files before it are stored (import again to finish)");
            return ExitCodes.BadInput;
        }
        catch (Exception e) when (WriteFailure.IsFullDisk(e))
        {
            // What was stored is listed as on any import, then one sentence for the file that did not fit.
            log.Error("Import stopped: the disk holding {Database} is full while storing {File}", db.Display, runner.InProgress);
            if (runner.Finished.Count > 0)
            {
                ImportReport.Write(cli.Out, runner.Finished, LogPath(db), width);
            }

            cli.Error.WriteLine("error: " + FullDisk(db, runner.InProgress, runner.Finished.Count));
            return ExitCodes.BadInput;
        }

        ImportReport.Write(cli.Out, outcomes, LogPath(db), width);
        if (outcomes.Any(o => o.Status == ImportStatus.Imported))
        {
            PeerPlaces.Keep(cli, store, db, log);
        }

        foreach (var entry in skipped)
        {
            log.Warning("Skipped {Entry}", entry);
            cli.Error.WriteLine("refused: " + Visible.Text(entry));
        }

        return skipped.Count > 0 || outcomes.Any(o => o.Status == ImportStatus.Refused) ? ExitCodes.BadInput
            : outcomes.Any(o => o.RefusedRows > 0) ? ExitCodes.Findings
            : ExitCodes.Ok;
    }

    // Names the database, the file that did not fit and what the files before it left stored.
    private static string FullDisk(StoreAddress db, string? file, int finished)
    {
        var where = db.Server is null ? $"the disk holding {db.Display} is full" : $"the database server {db.Display} ran out of disk space";
        var what = file is null ? "nothing of the file in progress was stored" : $"nothing of {Visible.Text(file)} was stored (its transaction was rolled back)";
        var before = finished switch
        {
            0 => "no file before it was stored",
            1 => "the 1 file before it is stored",
            _ => $"the {finished} files before it are stored",
        };
        return $"{where}; {what}, and {before}: free space there and import again (files already stored are recognised and skipped)";
    }

    public static string LogPath(StoreAddress db) => Path.Combine(db.Folder, "triptestlog.log");
}
