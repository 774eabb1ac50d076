using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using System.CommandLine;
using TripTestLog.Application.Findings;
using TripTestLog.Cli.Output;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;

namespace TripTestLog.Cli.Commands;

/// <summary>`findings`: what needs attention across the years, device by device: drift, trends, peers, contact and insulation, due dates.</summary>
internal static class FindingsCommand
{
    public static Command Create(CliContext cli)
    {
        var shared = new ConditionOptions();
        var kind = new Option<string?>("--kind") { Description = "Only this kind of finding (codes in docs/findings.md)", HelpName = "KIND" };
        var grade = new Option<string?>("--grade") { Description = "Only devices of this grade: sound ... take-out-of-service", HelpName = "GRADE" };
        var dueBefore = new Option<string?>("--due-before") { Description = "Only devices whose next test is due before this date", HelpName = "YYYY-MM-DD" };
        var closed = new Option<bool>("--include-closed") { Description = "Also list findings a later as-found test has closed" };
        var json = new Option<bool>("--json") { Description = "Write a JSON array, one object per finding" };
        var csv = new Option<bool>("--csv") { Description = "Write CSV, one row per finding (the --json fields)" };
        var failOn = new Option<bool>("--fail-on-findings") { Description = "Exit with 1 when any finding is open" };
        var command = new Command("findings", "What needs attention over the years, device by device, and why");
        foreach (var option in shared.All.Concat<Option>([kind, grade, dueBefore, closed, json, csv, failOn]))
        {
            command.Options.Add(option);
        }

        command.SetAction(parse =>
        {
            if (shared.Resolve(parse, cli) is not { } options)
            {
                return ExitCodes.BadInput;
            }

            FindingKind? onlyKind = null;
            if (parse.GetValue(kind) is { } k)
            {
                if (!TextCodes.FindingKind.TryParse(k, out var parsed))
                {
                    cli.Error.WriteLine($"error: --kind: '{k}' is not a finding kind; use one of {TextCodes.FindingKind.Choices}");
                    return ExitCodes.BadInput;
                }

                onlyKind = parsed;
            }

            ConditionGrade? onlyGrade = null;
            if (parse.GetValue(grade) is { } g)
            {
                if (!TextCodes.Grade.TryParse(g, out var parsed))
                {
                    cli.Error.WriteLine($"error: --grade: '{g}' is not a grade; use one of {TextCodes.Grade.Choices}");
                    return ExitCodes.BadInput;
                }

                onlyGrade = parsed;
            }

            DateOnly? before = null;
            if (parse.GetValue(dueBefore) is { } d)
            {
                if (!ConditionOptions.Date(d, "--due-before", cli, out var date))
                {
                    return ExitCodes.BadInput;
                }

                before = date;
            }

            if (parse.GetValue(json) && parse.GetValue(csv))
            {
                cli.Error.WriteLine("error: choose one of --json and --csv");
                return ExitCodes.BadInput;
            }

            var filter = new Filter(onlyKind, onlyGrade, before, parse.GetValue(closed));
            return Run(cli, options, filter, parse.GetValue(json), parse.GetValue(csv), parse.GetValue(failOn));
        });
        return command;
    }

    private sealed record Filter(FindingKind? Kind, ConditionGrade? Grade, DateOnly? DueBefore, bool IncludeClosed)
    {
        public bool Device(DeviceCondition d) => (Grade is null || d.Grade == Grade) && (DueBefore is null || d.DueOn < DueBefore);

        public List<Finding> Findings(DeviceCondition d) =>
            [.. d.Findings.Where(f => (IncludeClosed || f.Open) && (Kind is null || f.Kind == Kind))];
    }

    private static int Run(CliContext cli, ConditionOptions.Resolved options, Filter filter, bool json, bool csv, bool failOnFindings)
    {
        using var store = Stores.Open(cli, options.Database, StorePurpose.Read);
        if (options.Only is { } tag && store.Histories(tag).Count == 0)
        {
            cli.Error.WriteLine($"error: --asset: '{tag}' is not in the device register of {options.Database.Display}");
            return ExitCodes.BadInput;
        }

        var asOf = options.AsOf.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);
        IFindingWriter output = json ? new FindingJson(Visible.Exact(cli.Out)) : csv ? new FindingCsv(Visible.Exact(cli.Out)) : new FindingText(cli.Out, asOf, options.PolicyFrom);
        var anyOpen = false;
        try
        {
            foreach (var device in FindingsPipeline.Run(store, options.Policy, options.AsOf, options.Only, cli.Cancel))
            {
                if (!options.AtSite(device) || !filter.Device(device))
                {
                    continue;
                }

                var findings = filter.Findings(device);
                anyOpen |= findings.Any(f => f.Open);
                output.Add(device, findings);
            }

            output.Finish();
        }
        catch (OperationCanceledException)
        {
            cli.Error.WriteLine("findings stopped: the output above is incomplete");
            return ExitCodes.BadInput;
        }
        finally
        {
            (output as IDisposable)?.Dispose();
        }

        return failOnFindings && anyOpen ? ExitCodes.Findings : ExitCodes.Ok;
    }
}
