using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using System.CommandLine;
using System.Globalization;
using TripTestLog.Application.Findings;
using TripTestLog.Cli.Output;

namespace TripTestLog.Cli.Commands;

/// <summary>`fleet`: the asset manager's view: devices by site and grade, and what to act on first.</summary>
internal static class FleetCommand
{
    public static Command Create(CliContext cli)
    {
        var shared = new ConditionOptions();
        var top = new Option<int>("--top") { Description = "How many devices the priority list shows", DefaultValueFactory = _ => 15, HelpName = "N" };
        var json = new Option<bool>("--json") { Description = "Write one JSON object (fields in docs/findings.md)" };
        var csv = new Option<bool>("--csv") { Description = "Write which models fail as CSV: failure rate by make and model and by age band" };
        var command = new Command("fleet", "The fleet by site and condition grade, and what to act on first");
        foreach (var option in shared.All.Concat<Option>([top, json, csv]))
        {
            command.Options.Add(option);
        }

        command.SetAction(parse =>
        {
            if (shared.Resolve(parse, cli) is not { } options)
            {
                return ExitCodes.BadInput;
            }

            var n = parse.GetValue(top);
            if (n is < 1 or > 10000)
            {
                cli.Error.WriteLine($"error: --top: expected a number from 1 to 10000, got {n}");
                return ExitCodes.BadInput;
            }

            if (parse.GetValue(json) && parse.GetValue(csv))
            {
                cli.Error.WriteLine("error: --json and --csv: choose one");
                return ExitCodes.BadInput;
            }

            return Run(cli, options, n, parse.GetValue(json), parse.GetValue(csv));
        });
        return command;
    }

    private static int Run(CliContext cli, ConditionOptions.Resolved options, int top, bool json, bool csv)
    {
        using var store = Stores.Open(cli, options.Database, StorePurpose.Read);
        if (options.Only is { } tag && store.Histories(tag).Count == 0)
        {
            cli.Error.WriteLine($"error: --asset: '{tag}' is not in the device register of {options.Database.Display}");
            return ExitCodes.BadInput;
        }

        var fleet = new FleetSummary(top);
        var models = new FleetModels(options.Policy, store.Instruments(), options.AsOf);
        try
        {
            foreach (var report in FindingsPipeline.RunWithRecords(store, options.Policy, options.AsOf, options.Only, cli.Cancel))
            {
                if (options.AtSite(report.Condition))
                {
                    fleet.Add(report.Condition);
                    models.Add(report);
                }
            }
        }
        catch (OperationCanceledException)
        {
            cli.Error.WriteLine("fleet stopped: nothing was written");
            return ExitCodes.BadInput;
        }

        var asOf = options.AsOf.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
        if (json)
        {
            FleetJson.Write(Visible.Exact(cli.Out), fleet, asOf, options.PolicyFrom, models);
        }
        else if (csv)
        {
            FleetModelsOutput.WriteCsv(Visible.Exact(cli.Out), models);
        }
        else
        {
            FleetText.Write(cli.Out, fleet, asOf, options.PolicyFrom, models);
        }

        return ExitCodes.Ok;
    }
}
