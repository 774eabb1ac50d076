using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using System.CommandLine;
using TripTestLog.Cli.Output;
using TripTestLog.Cli.Services;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Commands;

/// <summary>`demo`: a fresh database from the sample records, checked, with the outputs written to one folder.</summary>
internal static class DemoCommand
{
    public static Command Create(CliContext cli)
    {
        var records = new Option<DirectoryInfo?>("--records")
        {
            Description = "Folder of record files (default: the project's sample-records folder)",
            HelpName = "FOLDER",
        };
        var output = new Option<DirectoryInfo>("--out")
        {
            Description = "Folder for the demo database, log and verdicts; its old demo database is replaced",
            DefaultValueFactory = _ => new DirectoryInfo("demo-output"),
            HelpName = "FOLDER",
        };
        var command = new Command("demo", "Build a fresh database from the sample records, check every trip test, and say where the results are")
        {
            records, output,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(records), parse.GetValue(output)!));
        return command;
    }

    private static int Run(CliContext cli, DirectoryInfo? records, DirectoryInfo output)
    {
        var folder = records?.FullName ?? FindSampleRecords();
        if (folder is null || !Directory.Exists(folder))
        {
            cli.Error.WriteLine("error: sample-records folder not found; run from the project folder or give --records FOLDER");
            return ExitCodes.BadInput;
        }

        output.Create();
        var db = new FileInfo(Path.Combine(output.FullName, "triptestlog.db"));
        foreach (var stale in new[] { db.FullName, db.FullName + "-wal", db.FullName + "-shm" })
        {
            File.Delete(stale);
        }

        var (files, problems) = ImportRunner.Expand([folder], Ingest.ReadOptions.Default);
        foreach (var problem in problems)
        {
            cli.Error.WriteLine("warning: " + problem);
        }

        IReadOnlyList<ImportOutcome> outcomes;
        var text = Path.Combine(output.FullName, "verdicts.txt");
        var json = Path.Combine(output.FullName, "verdicts.json");
        var counts = new VerdictCounts();
        using (var log = Logging.BesideDatabase(db))
        using (var store = RecordStore.Open(db.FullName))
        using (var textWriter = new StreamWriter(text))
        using (var jsonWriter = new StreamWriter(json))
        {
            outcomes = new ImportRunner(store, log, cli).Run(files, ImportOptions.Strict);
            var writers = new VerdictWriters(new VerdictTable(textWriter), new VerdictJson(jsonWriter), counts);
            foreach (var judged in CheckPipeline.Run(store))
            {
                writers.Add(judged);
            }

            writers.Finish();
        }

        cli.Out.WriteLine($"Imported the sample records from {folder}:");
        ImportReport.Write(cli.Out, outcomes, ImportCommand.LogPath(db));
        cli.Out.WriteLine();
        cli.Out.WriteLine(counts.Summary("Checked"));
        cli.Out.WriteLine();
        cli.Out.WriteLine("Results:");
        cli.Out.WriteLine($"  database   {db.FullName}");
        cli.Out.WriteLine($"  verdicts   {text}");
        cli.Out.WriteLine($"  json       {json}");
        cli.Out.WriteLine($"  log        {ImportCommand.LogPath(db)}");
        cli.Out.WriteLine($"Next: triptestlog check --db {db.FullName}");
        return outcomes.Any(o => o.Status == ImportStatus.Refused) ? ExitCodes.BadInput : ExitCodes.Ok;
    }

    /// <summary>The sample-records folder next to the working folder or any folder above it, then above the program.</summary>
    private static string? FindSampleRecords()
    {
        foreach (var start in new[] { Directory.GetCurrentDirectory(), AppContext.BaseDirectory })
        {
            for (var dir = new DirectoryInfo(start); dir is not null; dir = dir.Parent)
            {
                var candidate = Path.Combine(dir.FullName, "sample-records");
                if (Directory.Exists(candidate))
                {
                    return candidate;
                }
            }
        }

        return null;
    }
}
