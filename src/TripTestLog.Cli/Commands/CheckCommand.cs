using TripTestLog.Application.Stores;
using System.CommandLine;
using TripTestLog.Application.Check;
using TripTestLog.Cli.Output;
using TripTestLog.Cli.Services;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Cli.Commands;

/// <summary>`check`: the verdict of every stored trip test, as a table, JSON or CSV, optionally filtered.</summary>
internal static class CheckCommand
{
    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.ExistingDatabase();
        var asset = new Option<string?>("--asset") { Description = "Only this device's tests", HelpName = "TAG" };
        var site = new Option<string?>("--site") { Description = "Only tests of devices at this site", HelpName = "SITE" };
        var from = new Option<string?>("--from") { Description = "Only tests on or after this date", HelpName = "YYYY-MM-DD" };
        var to = new Option<string?>("--to") { Description = "Only tests on or before this date", HelpName = "YYYY-MM-DD" };
        var verdict = new Option<string[]>("--verdict")
        {
            Description = $"Only these verdicts ({TextCodes.Verdict.Choices}); repeat or separate with commas", HelpName = "VERDICT",
            AllowMultipleArgumentsPerToken = false,
        };
        var stage = new Option<string?>("--stage") { Description = $"Only this stage ({TextCodes.Stage.Choices})", HelpName = "STAGE" };
        var family = new Option<string?>("--family") { Description = $"Only this family ({string.Join(", ", FamilyCodes.All)})", HelpName = "FAMILY" };
        var json = new Option<bool>("--json") { Description = "Write a JSON array, one object per trip test (fields in docs/judging.md)" };
        var wide = new Option<bool>("--wide") { Description = "Write every column of the table (stage, current, basis, the whole tag), however wide" };
        var csv = new Option<bool>("--csv") { Description = "Write CSV, the same fields as --json, with formula cells neutralised" };
        var failOnFindings = new Option<bool>("--fail-on-findings") { Description = "Exit with 1 when any test shown is too early or too late, or its instrument was not traceable" };
        var registered = new Option<bool>("--require-registered-instruments") { Description = "Report tests made with an instrument missing from the instrument register" };
        var policy = new Option<FileInfo?>("--policy") { Description = "Lab policy file (default: lab-policy.conf beside the database)", HelpName = "FILE" };
        var command = new Command("check", "Judge every trip test against the band its standard allows: pass, too-early, too-late or not-assessable")
        {
            db, asset, site, from, to, verdict, stage, family, json, csv, wide, failOnFindings, registered, policy,
        };
        command.SetAction(parse =>
        {
            if (parse.GetValue(json) && parse.GetValue(csv))
            {
                return Usage(cli, "--json and --csv: choose one");
            }

            if (Filter(cli, parse.GetValue(site), parse.GetValue(from), parse.GetValue(to), parse.GetValue(verdict) ?? [], parse.GetValue(stage),
                parse.GetValue(family)) is not { } filter)
            {
                return ExitCodes.BadInput;
            }

            var format = parse.GetValue(json) ? "json" : parse.GetValue(csv) ? "csv" : parse.GetValue(wide) ? "wide" : "table";
            return Run(cli, parse.GetValue(db)!, parse.GetValue(asset), filter, format, parse.GetValue(failOnFindings), parse.GetValue(registered), parse.GetValue(policy));
        });
        return command;
    }

    private static CheckFilter? Filter(CliContext cli, string? site, string? fromText, string? toText, string[] verdictTexts, string? stageText, string? familyText)
    {
        DateOnly? from = null, to = null;
        if (fromText is not null)
        {
            if (!ConditionOptions.Date(fromText, "--from", cli, out var d))
            {
                return null;
            }

            from = d;
        }

        if (toText is not null)
        {
            if (!ConditionOptions.Date(toText, "--to", cli, out var d))
            {
                return null;
            }

            to = d;
        }

        if (from > to)
        {
            Usage(cli, $"--from {from:yyyy-MM-dd} is after --to {to:yyyy-MM-dd}");
            return null;
        }

        HashSet<Verdict>? verdicts = null;
        foreach (var text in verdictTexts.SelectMany(v => v.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)))
        {
            if (!TextCodes.Verdict.TryParse(text, out var v))
            {
                Usage(cli, $"--verdict: '{text}' is not a verdict; use {TextCodes.Verdict.Choices}");
                return null;
            }

            (verdicts ??= []).Add(v);
        }

        TestStage? stage = null;
        if (stageText is not null)
        {
            if (!TextCodes.Stage.TryParse(stageText, out var s))
            {
                Usage(cli, $"--stage: '{stageText}' is not a stage; use {TextCodes.Stage.Choices}");
                return null;
            }

            stage = s;
        }

        DeviceFamily? family = null;
        if (familyText is not null)
        {
            if (!FamilyCodes.TryParse(familyText, out var f))
            {
                Usage(cli, $"--family: '{familyText}' is not a family; use one of {string.Join(", ", FamilyCodes.All)}");
                return null;
            }

            family = f;
        }

        return new CheckFilter(site, from, to, verdicts, stage, family);
    }

    private static int Run(CliContext cli, StoreAddress db, string? asset, CheckFilter filter, string format, bool failOnFindings, bool requireRegistered, FileInfo? policyFile)
    {
        if (CommonOptions.Missing(cli, db))
        {
            return ExitCodes.BadInput;
        }

        AssetTag? only = null;
        if (asset is not null)
        {
            if (!AssetTag.IsValid(asset, out var reason))
            {
                return Usage(cli, $"--asset: {reason}");
            }

            only = AssetTag.Of(asset);
        }

        // The lab policy's ambient warning and instrument rule apply to verdicts as they do to findings.
        if (PolicyLoader.Load(policyFile, db, out var problem) is not { } policy)
        {
            return Usage(cli, problem!);
        }

        using var store = Stores.Open(cli, db, StorePurpose.Read);
        if (only is { } tag && store.Histories(tag).Count == 0)
        {
            return Usage(cli, $"--asset: '{tag}' is not in the device register of {db.Display}");
        }

        var counts = new VerdictCounts();
        IVerdictWriter writer = format switch
        {
            "json" => new VerdictJson(Visible.Exact(cli.Out)),
            "csv" => new VerdictCsv(Visible.Exact(cli.Out)),
            "wide" => new VerdictTable(cli.Out, wide: true),
            _ => new VerdictTable(cli.Out),
        };
        var output = new VerdictWriters(writer, counts);
        try
        {
            foreach (var judged in CheckPipeline.Run(store, only, requireRegistered || policy.Policy.RequireRegisteredInstruments, cli.Cancel, policy.Policy.AmbientNoteKelvin, policy.Policy.PointWindowPercent / 100, policy.Policy.Decision))
            {
                if (filter.Admits(judged))
                {
                    output.Add(judged);
                }
            }
        }
        catch (OperationCanceledException)
        {
            cli.Error.WriteLine("check stopped: the output above is incomplete");
            return ExitCodes.BadInput;
        }

        output.Finish();
        return failOnFindings && counts.AnyFinding ? ExitCodes.Findings : ExitCodes.Ok;
    }

    private static int Usage(CliContext cli, string message)
    {
        cli.Error.WriteLine("error: " + message);
        return ExitCodes.BadInput;
    }
}
