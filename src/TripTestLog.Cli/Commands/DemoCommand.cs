using TripTestLog.Application.Stores;
using TripTestLog.Application.Import;
using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Application.Reports;
using System.CommandLine;
using TripTestLog.Cli.Output;
using TripTestLog.Cli.Services;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Cli.Commands;

/// <summary>`demo`: a fresh database from the sample records, checked, with the outputs written to one folder.</summary>
internal static class DemoCommand
{
    public static Command Create(CliContext cli)
    {
        var records = new Option<DirectoryInfo?>("--records")
        {
            Description = "Folder of record files (default: the sample-records folder here or above, else the one shipped with the tool)",
            HelpName = "FOLDER",
        };
        var output = new Option<DirectoryInfo>("--out")
        {
            Description = "Folder for the demo database, log and verdicts; its old demo database is replaced",
            DefaultValueFactory = _ => new DirectoryInfo("demo-output"),
            HelpName = "FOLDER",
        };
        var asOf = new Option<string?>("--as-of")
        {
            Description = $"Judge as of this date (default: {SampleRecordsAsOf:yyyy-MM-dd}, the sample records' own date; today with --records)",
            HelpName = "YYYY-MM-DD",
        };
        var command = new Command("demo", "Build a fresh database from the sample records, check every trip test, and say where the results are")
        {
            records, output, asOf,
        };
        command.SetAction(async (parse, _) =>
        {
            // The bundled records were written for one date; judging them on it gives the same answer on any machine's clock.
            var date = parse.GetValue(records) is null ? SampleRecordsAsOf : cli.Today;
            if (!ConditionOptions.AsOfDate(parse.GetValue(asOf), date, cli, out date))
            {
                return ExitCodes.BadInput;
            }

            return await RunAsync(cli, parse.GetValue(records), parse.GetValue(output)!, date).ConfigureAwait(false);
        });
        return command;
    }

    /// <summary>The folder, beside the demo's own report, of the report written under the guarded decision rule.</summary>
    public const string GuardedReport = "report-guarded";

    /// <summary>The date the bundled sample records were written for: their tests lie before it, their calibrations span it.</summary>
    public static readonly DateOnly SampleRecordsAsOf = new(2026, 12, 1);

    private static async Task<int> RunAsync(CliContext cli, DirectoryInfo? records, DirectoryInfo output, DateOnly asOf)
    {
        var folder = records?.FullName ?? FindSampleRecords();
        if (folder is null || !Directory.Exists(folder))
        {
            cli.Error.WriteLine("error: sample-records folder not found; run from the project folder or give --records FOLDER");
            return ExitCodes.BadInput;
        }

        output.Create();
        var db = StoreAddress.OfFile(Path.Combine(output.FullName, "triptestlog.db"));
        foreach (var stale in new[] { db.Display, db.Display + "-wal", db.Display + "-shm" })
        {
            File.Delete(stale);
        }

        // The sample labs' policy goes beside the database, where findings and fleet look for it.
        var samplePolicy = Path.Combine(folder, PolicyFile.BesideDatabase);
        var policyFile = Path.Combine(output.FullName, PolicyFile.BesideDatabase);
        if (File.Exists(samplePolicy))
        {
            File.Copy(samplePolicy, policyFile, overwrite: true);
        }

        if (PolicyLoader.Load(null, db, out var policyProblem) is not { } policy)
        {
            cli.Error.WriteLine($"error: {policyProblem}");
            return ExitCodes.BadInput;
        }

        var (files, problems, _) = ImportRunner.Expand([folder], Ingest.ReadOptions.Default);
        foreach (var problem in problems)
        {
            cli.Error.WriteLine("warning: " + problem);
        }

        IReadOnlyList<ImportOutcome> outcomes;
        var text = Path.Combine(output.FullName, "verdicts.txt");
        var json = Path.Combine(output.FullName, "verdicts.json");
        var counts = new VerdictCounts();
        var attention = new AttentionList(8);
        var findingsText = Path.Combine(output.FullName, "findings.txt");
        var findingsJson = Path.Combine(output.FullName, "findings.json");
        var fleet = new FleetSummary(5);
        string reportPage;
        string guardedPage;
        using (var log = Logging.BesideDatabase(db))
        using (var store = Stores.Open(cli, db, StorePurpose.Import))
        using (var textWriter = new StreamWriter(text))
        using (var jsonWriter = new StreamWriter(json))
        {
            outcomes = new ImportRunner(store, log, cli).Run(files, ImportOptions.Strict, asOf);
            PeerPlaces.Keep(cli, store, db, log);
            var writers = new VerdictWriters(new VerdictTable(textWriter), new VerdictJson(jsonWriter), counts, attention);
            foreach (var judged in CheckPipeline.Run(store, null, policy.Policy.RequireRegisteredInstruments, cli.Cancel, policy.Policy.AmbientNoteKelvin, policy.Policy.PointWindowPercent / 100, policy.Policy.Decision))
            {
                writers.Add(judged);
            }

            writers.Finish();

            // One run of the findings writes the report, the findings files and the fleet summary the demo prints.
            using var findingsTextWriter = new StreamWriter(findingsText);
            using var findingsJsonWriter = new StreamWriter(findingsJson);
            var findingsTable = new FindingText(findingsTextWriter, asOf.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture), policy.From);
            using var findingsRows = new FindingJson(findingsJsonWriter);
            var context = new Reports.ReportContext(db.Display, ReportRun.ToolVersion, asOf, cli.Clock.GetUtcNow(), policy.Policy, policy.From, store.Instruments());
            reportPage = (await ReportRun.WriteAsync(store, Path.Combine(output.FullName, "report"), context, ReportSelection.All, cli.Cancel,
                device =>
                {
                    var open = device.Condition.Open.ToList();
                    findingsTable.Add(device.Condition, open);
                    findingsRows.Add(device.Condition, open);
                    fleet.Add(device.Condition);
                }).ConfigureAwait(false)).FleetPage;
            findingsTable.Finish();
            findingsRows.Finish();

            // The same records once more under the guarded decision rule, so the pages show what it changes.
            var guarded = policy.Policy with { DecisionRule = DecisionRule.Guarded };
            var guardedFrom = $"{policy.From}, with decision_rule = {Domain.Codes.TextCodes.DecisionRule.Of(DecisionRule.Guarded)} for this copy";
            var guardedContext = context with { Policy = guarded, PolicyFrom = guardedFrom };
            guardedPage = (await ReportRun.WriteAsync(store, Path.Combine(output.FullName, GuardedReport), guardedContext, ReportSelection.All, cli.Cancel)
                .ConfigureAwait(false)).FleetPage;
        }

        cli.Out.WriteLine($"Imported the sample records from {folder}:");
        ImportReport.Write(cli.Out, outcomes, ImportCommand.LogPath(db));
        cli.Out.WriteLine();
        cli.Out.WriteLine(counts.Summary("Checked"));
        attention.WriteTo(cli.Out);
        cli.Out.WriteLine();
        FleetText.Write(cli.Out, fleet, asOf.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture), policy.From);
        cli.Out.WriteLine();
        cli.Out.WriteLine("Results:");
        cli.Out.WriteLine($"  database   {db.Display}");
        cli.Out.WriteLine($"  verdicts   {text}");
        cli.Out.WriteLine($"  json       {json}");
        cli.Out.WriteLine($"  findings   {findingsText}");
        cli.Out.WriteLine($"  json       {findingsJson}");
        cli.Out.WriteLine($"  log        {ImportCommand.LogPath(db)}");
        cli.Out.WriteLine($"  report     {reportPage}");
        cli.Out.WriteLine($"  guarded    {guardedPage}");
        cli.Out.WriteLine($"Next: triptestlog check --db {db.Display}");
        cli.Out.WriteLine($"      triptestlog findings --db {db.Display}");
        cli.Out.WriteLine($"      triptestlog fleet --db {db.Display}");
        return outcomes.Any(o => o.Status == ImportStatus.Refused) ? ExitCodes.BadInput : ExitCodes.Ok;
    }

    /// <summary>
    /// The sample-records folder next to the working folder or any folder above it, then the one shipped beside the program
    /// (the tool carries a copy, so the demo runs wherever it is installed).
    /// </summary>
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
