using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using System.CommandLine;
using System.Globalization;
using TripTestLog.Cli.Output;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Cli.Commands;

/// <summary>`history --asset TAG`: a device's register entries as they were imported, and every correction of its records.</summary>
internal static class HistoryCommand
{
    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.ExistingDatabase();
        var asset = new Option<string>("--asset") { Description = "The device", HelpName = "TAG", Required = true };
        var command = new Command("history", "Show a device's register entries (ratings and settings over time) and the corrections applied to its records")
        {
            db, asset,
        };
        command.SetAction(parse => Run(cli, parse.GetValue(db)!, parse.GetValue(asset)!));
        return command;
    }

    private static int Run(CliContext cli, StoreAddress db, string asset)
    {
        if (CommonOptions.Missing(cli, db))
        {
            return ExitCodes.BadInput;
        }

        if (!AssetTag.IsValid(asset, out var reason))
        {
            cli.Error.WriteLine($"error: --asset: {reason}");
            return ExitCodes.BadInput;
        }

        using var store = Stores.Open(cli, db, StorePurpose.Read);
        var tag = AssetTag.Of(asset);
        var revisions = store.Revisions(tag);
        if (revisions.Count == 0)
        {
            cli.Error.WriteLine($"error: --asset: '{asset}' is not in the device register of {db.Display}");
            return ExitCodes.BadInput;
        }

        var latest = revisions[^1].Entry;
        Wrapped.Write(cli.Out, $"{tag}: {latest.Site}, {latest.Location}; {FamilyCodes.Of(latest.Family)}, In {latest.RatedCurrent}, {latest.Poles} poles, "
            + $"{latest.Make} {latest.Model} serial {latest.Serial}".TrimEnd(), 0, 2);
        cli.Out.WriteLine();
        cli.Out.WriteLine($"Register entries ({revisions.Count}), oldest first:");
        foreach (var r in revisions)
        {
            cli.Out.WriteLine($"  in force from {(r.Entry.SettingsFrom is { } from ? Day(from) : "the start")}: "
                + $"{r.SourceFile}:{r.SourceLine}, imported {r.RecordedAt.ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture)} UTC");
            Wrapped.Write(cli.Out, $"In {r.Entry.RatedCurrent}, {r.Entry.Poles} poles, {r.Entry.RatedVoltage}; {r.Entry.Settings.Summary}"
                + (r.Entry.ContactLimit is { } limit ? $"; contact limit {limit}" : ""), 4, 6);
        }
        cli.Out.WriteLine();
        var corrections = store.Corrections(tag);
        if (corrections.Count == 0)
        {
            cli.Out.WriteLine("No record of this device has been corrected.");
            return ExitCodes.Ok;
        }

        cli.Out.WriteLine($"Corrections applied with import --replace ({corrections.Count}), oldest first:");
        foreach (var c in corrections)
        {
            Wrapped.Write(cli.Out, $"{c.ChangedAt:yyyy-MM-dd HH:mm}: {c.Record}: {c.Column} {c.Old} -> {c.New} (was from {c.OldFile}, corrected by {c.NewFile})", 2, 4);
        }

        return ExitCodes.Ok;
    }

    private static string Day(DateOnly d) => d.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
}
