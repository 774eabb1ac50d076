using TripTestLog.Application.Text;
using TripTestLog.Application.Reports;
using TripTestLog.Application.Stores;
using System.CommandLine;
using System.Diagnostics;
using TripTestLog.Cli.Services;
using TripTestLog.Reports;

namespace TripTestLog.Cli.Commands;

/// <summary>`report`: a folder of self-contained HTML pages (fleet and devices) with CSV and JSON beside them.</summary>
internal static class ReportCommand
{
    public static Command Create(CliContext cli)
    {
        var shared = new ConditionOptions();
        var output = new Option<DirectoryInfo?>("--out") { Description = "Folder for the report (default: report/ beside the database)", HelpName = "DIR" };
        var from = new Option<string?>("--from") { Description = "Show trip tests from this date", HelpName = "YYYY-MM-DD" };
        var to = new Option<string?>("--to") { Description = "Show trip tests up to this date", HelpName = "YYYY-MM-DD" };
        var pages = new Option<string>("--device-pages")
        {
            Description = "Write a page per device (all) or the fleet page only (none)", DefaultValueFactory = _ => "all", HelpName = "all|none",
        };
        var command = new Command("report", "Write HTML pages a person reads: the fleet page, a page per device, with CSV and JSON beside them");
        foreach (var option in shared.All.Concat<Option>([output, from, to, pages]))
        {
            command.Options.Add(option);
        }

        command.SetAction(async (parse, _) =>
        {
            if (shared.Resolve(parse, cli) is not { } options)
            {
                return ExitCodes.BadInput;
            }

            DateOnly? first = null, last = null;
            if (parse.GetValue(from) is { } f)
            {
                if (!ConditionOptions.Date(f, "--from", cli, out var d))
                {
                    return ExitCodes.BadInput;
                }

                first = d;
            }

            if (parse.GetValue(to) is { } t)
            {
                if (!ConditionOptions.Date(t, "--to", cli, out var d))
                {
                    return ExitCodes.BadInput;
                }

                last = d;
            }

            if (parse.GetValue(pages) is not ("all" or "none"))
            {
                cli.Error.WriteLine($"error: --device-pages: expected all or none, got '{parse.GetValue(pages)}'");
                return ExitCodes.BadInput;
            }

            var folder = parse.GetValue(output)?.FullName ?? Path.Combine(options.Database.Folder, "report");
            return await RunAsync(cli, options, folder, new ReportSelection(options.Site, options.Only, first, last, parse.GetValue(pages) == "all")).ConfigureAwait(false);
        });
        return command;
    }

    private static async Task<int> RunAsync(CliContext cli, ConditionOptions.Resolved options, string folder, ReportSelection selection)
    {
        try
        {
            Directory.CreateDirectory(folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            cli.Error.WriteLine($"error: --out: cannot write the report to {folder}: {e.Message}");
            return ExitCodes.BadInput;
        }

        using var store = Stores.Open(cli, options.Database, StorePurpose.Read);
        if (options.Only is { } tag && store.Histories(tag).Count == 0)
        {
            cli.Error.WriteLine($"error: --asset: '{tag}' is not in the device register of {options.Database.Display}");
            return ExitCodes.BadInput;
        }

        var context = new ReportContext(options.Database.Display, ReportRun.ToolVersion, options.AsOf, cli.Clock.GetUtcNow(), options.Policy,
            options.PolicyFrom, store.Instruments());
        var clock = Stopwatch.StartNew();
        // The progress line is cleared before anything else is said, on either stream.
        var progress = Progress.For(cli, selection.Only is null ? (int)store.Counts().Devices : 1);
        try
        {
            string page;
            int devices;
            using (progress)
            {
                (page, devices) = await ReportRun.WriteAsync(store, folder, context, selection, cli.Cancel, progress: progress).ConfigureAwait(false);
            }

            cli.Out.WriteLine($"Wrote {Counted.Of(devices, "device page")} and the fleet page in {clock.Elapsed.TotalSeconds:0.0} s.");
            cli.Out.WriteLine($"Fleet page: {page}");
            return ExitCodes.Ok;
        }
        catch (OperationCanceledException)
        {
            cli.Error.WriteLine("report stopped: the fleet page and the CSV and JSON files of an earlier report are left as they were; device pages may be a mix of both runs");
            return ExitCodes.BadInput;
        }
    }
}
