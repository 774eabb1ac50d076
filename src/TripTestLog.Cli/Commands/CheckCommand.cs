using System.CommandLine;
using TripTestLog.Cli.Output;
using TripTestLog.Cli.Services;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Storage;

namespace TripTestLog.Cli.Commands;

/// <summary>`check`: the verdict of every stored trip test, as a table or as JSON.</summary>
internal static class CheckCommand
{
    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.ExistingDatabase();
        var asset = new Option<string?>("--asset") { Description = "Only this device's tests", HelpName = "TAG" };
        var json = new Option<bool>("--json") { Description = "Write a JSON array, one object per trip test (fields in the README)" };
        var failOnFindings = new Option<bool>("--fail-on-findings") { Description = "Exit with 1 when any test is too early or too late, or its instrument was not traceable" };
        var registered = new Option<bool>("--require-registered-instruments") { Description = "Report tests made with an instrument missing from the instrument register" };
        var policy = new Option<FileInfo?>("--policy") { Description = "Lab policy file (default: lab-policy.conf beside the database)", HelpName = "FILE" };
        var command = new Command("check", "Judge every trip test against the band its standard allows: pass, too-early, too-late or not-assessable")
        {
            db, asset, json, failOnFindings, registered, policy,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(db)!, parse.GetValue(asset), parse.GetValue(json), parse.GetValue(failOnFindings), parse.GetValue(registered),
            parse.GetValue(policy)));
        return command;
    }

    private static int Run(CliContext cli, FileInfo db, string? asset, bool json, bool failOnFindings, bool requireRegistered, FileInfo? policyFile)
    {
        if (!db.Exists)
        {
            cli.Error.WriteLine($"error: no database at {db.FullName}; import records first (triptestlog import PATH --db {db.FullName})");
            return ExitCodes.BadInput;
        }

        AssetTag? only = null;
        if (asset is not null)
        {
            if (!AssetTag.IsValid(asset, out var reason))
            {
                cli.Error.WriteLine($"error: --asset: {reason}");
                return ExitCodes.BadInput;
            }

            only = AssetTag.Of(asset);
        }

        // The lab policy's ambient warning and instrument rule apply to verdicts as they do to findings.
        if (PolicyLoader.Load(policyFile, db, out var problem) is not { } policy)
        {
            cli.Error.WriteLine($"error: {problem}");
            return ExitCodes.BadInput;
        }

        using var store = RecordStore.Open(db.FullName);
        if (only is { } tag && !store.Devices(tag).Any())
        {
            cli.Error.WriteLine($"error: --asset: '{tag}' is not in the device register of {db.FullName}");
            return ExitCodes.BadInput;
        }

        var counts = new VerdictCounts();
        var output = new VerdictWriters(json ? new VerdictJson(cli.Out) : new VerdictTable(cli.Out), counts);
        try
        {
            foreach (var judged in CheckPipeline.Run(store, only, requireRegistered || policy.Policy.RequireRegisteredInstruments, cli.Cancel, policy.Policy.AmbientNoteKelvin))
            {
                output.Add(judged);
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
}
