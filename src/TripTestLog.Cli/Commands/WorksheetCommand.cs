using TripTestLog.Application.Stores;
using System.CommandLine;
using System.Text;
using TripTestLog.Application.Worksheet;
using TripTestLog.Cli.Output;
using TripTestLog.Cli.Services;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Reports;

namespace TripTestLog.Cli.Commands;

/// <summary>`worksheet`: before the test, what to inject on each device, in which order, and what passes; a printable page and pre-filled CSVs.</summary>
internal static class WorksheetCommand
{
    public const string PageFile = "worksheet.html";

    public static Command Create(CliContext cli)
    {
        var shared = new ConditionOptions();
        shared.AsOf.Description = "Plan with the settings in force on this date (default: today)";
        shared.Site.Description = "Plan every device at this site";
        shared.Asset.Description = "Plan this device";
        var stage = new Option<string>("--stage") { Description = "The stage the tests will be recorded as", DefaultValueFactory = _ => "as-found", HelpName = "as-found|as-left" };
        var output = new Option<DirectoryInfo?>("--out") { Description = "Folder for the worksheet (default: worksheet/ beside the database)", HelpName = "DIR" };
        var command = new Command("worksheet", "Plan the tests of a device or a site: a printable page of points, windows and limits, with pre-filled CSVs to import");
        foreach (var option in shared.All.Concat<Option>([stage, output]))
        {
            command.Options.Add(option);
        }

        command.SetAction(parse =>
        {
            if (shared.Resolve(parse, cli) is not { } options)
            {
                return ExitCodes.BadInput;
            }

            if (options.Only is null && options.Site is null)
            {
                cli.Error.WriteLine("error: give --asset TAG or --site SITE: a worksheet is for the devices about to be tested");
                return ExitCodes.BadInput;
            }

            if (!TextCodes.Stage.TryParse(parse.GetValue(stage)!, out var testStage))
            {
                cli.Error.WriteLine($"error: --stage: '{parse.GetValue(stage)}' is not a stage; use {TextCodes.Stage.Choices}");
                return ExitCodes.BadInput;
            }

            var folder = parse.GetValue(output)?.FullName ?? Path.Combine(options.Database.Folder, "worksheet");
            return Run(cli, options, testStage, folder);
        });
        return command;
    }

    private static int Run(CliContext cli, ConditionOptions.Resolved options, TestStage stage, string folder)
    {
        using var store = Stores.Open(cli, options.Database, StorePurpose.Read);
        var histories = store.Histories(options.Only);
        var selected = histories.Values
            .Where(h => options.Only is { } tag ? h.Latest.Tag == tag : string.Equals(h.InForceOn(options.AsOf).Site, options.Site, StringComparison.OrdinalIgnoreCase))
            .OrderBy(h => h.Latest.Tag.Value, StringComparer.Ordinal)
            .ToList();
        if (selected.Count == 0)
        {
            cli.Error.WriteLine(options.Only is { } t
                ? $"error: --asset: '{t}' is not in the device register of {options.Database.Display}"
                : $"error: --site: no device in the register is at '{options.Site}'");
            return ExitCodes.BadInput;
        }

        try
        {
            Directory.CreateDirectory(folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            cli.Error.WriteLine($"error: --out: cannot write the worksheet to {folder}: {e.Message}");
            return ExitCodes.BadInput;
        }

        if (WorksheetCsv.FirstWithResults(folder) is { } filled)
        {
            Wrapped.Write(cli.Error, $"error: {filled.File} already holds results (line {filled.Line}); import it first or move it, "
                + "or give another --out: a new worksheet would overwrite it", 0);
            return ExitCodes.BadInput;
        }

        var tables = store.CurveTables();
        var what = options.Only is { } only ? only.Value : $"site {selected[0].InForceOn(options.AsOf).Site}";
        var page = Path.Combine(folder, PageFile);
        long trips = 0, contacts = 0, insulation = 0;
        using (var html = new StreamWriter(page, append: false, new UTF8Encoding(false)))
        using (var csv = new WorksheetCsv(folder))
        {
            var sheet = new WorksheetWriter(html, $"Test worksheet: {what}",
                $"{TextCodes.Stage.Of(stage)} tests; settings in force on {options.AsOf:yyyy-MM-dd}; {selected.Count} device{(selected.Count == 1 ? "" : "s")}",
                options.Policy.Decision);
            foreach (var history in selected)
            {
                var plan = WorksheetPlanner.For(history, options.AsOf, stage, tables, options.Policy);
                sheet.Add(plan);
                csv.Add(plan);
                (trips, contacts, insulation) = (trips + plan.Trips.Count, contacts + plan.Contacts.Count, insulation + plan.Insulation.Count);
            }

            sheet.Finish($"TripTestLog {ReportRun.ToolVersion}; database {options.Database.Display}; policy: {options.PolicyFrom}; "
                + $"written {cli.Clock.GetUtcNow():yyyy-MM-dd HH:mm} UTC");
        }

        cli.Out.WriteLine($"Planned {trips} trip, {contacts} contact and {insulation} insulation tests on {selected.Count} device{(selected.Count == 1 ? "" : "s")}.");
        cli.Out.WriteLine($"Worksheet: {page}");
        Wrapped.Write(cli.Out, $"Fill in {WorksheetCsv.TripFile}, {WorksheetCsv.ContactFile} and {WorksheetCsv.InsulationFile} beside it, "
            + "then import the folder; rows left blank count as not tested.", 0);
        return ExitCodes.Ok;
    }
}
