using TripTestLog.Application.Stores;
using TripTestLog.Cli.Services;
using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using TripTestLog.Cli.Output;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Cli.Commands;

/// <summary>`devices`: the register with the settings in force, site by site, or as JSON.</summary>
internal static class DevicesCommand
{
    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.ExistingDatabase();
        var site = new Option<string?>("--site") { Description = "Only devices at this site", HelpName = "SITE" };
        var asOf = new Option<string?>("--as-of") { Description = "The settings in force on this date (default: today)", HelpName = "YYYY-MM-DD" };
        var json = new Option<bool>("--json") { Description = "Write a JSON array, one object per device (fields in docs/commands.md)" };
        var wide = new Option<bool>("--wide") { Description = "Show the settings whole, however wide" };
        var command = new Command("devices", "List the device register with the settings in force, site by site") { db, site, asOf, json, wide };
        command.SetAction(parse =>
        {
            var date = cli.Today;
            if (!ConditionOptions.AsOfDate(parse.GetValue(asOf), date, cli, out date))
            {
                return ExitCodes.BadInput;
            }

            return Run(cli, parse.GetValue(db)!, parse.GetValue(site), date, parse.GetValue(json), parse.GetValue(wide));
        });
        return command;
    }

    private static int Run(CliContext cli, StoreAddress db, string? site, DateOnly on, bool json, bool wide)
    {
        if (CommonOptions.Missing(cli, db))
        {
            return ExitCodes.BadInput;
        }

        using var store = Stores.Open(cli, db, StorePurpose.Read);
        // Plain loops and a class rather than LINQ over tuples: code made for a value type is compiled at run time, and
        // this listing is run at the bench, where start-up is most of its time.
        var devices = new List<Listed>();
        foreach (var history in store.Histories().Values)
        {
            var entry = history.InForceOn(on);
            if (site is null || string.Equals(entry.Site, site, StringComparison.OrdinalIgnoreCase))
            {
                devices.Add(new Listed(entry, history.Entries.Count));
            }
        }

        devices.Sort(static (a, b) => string.CompareOrdinal(a.Entry.Site, b.Entry.Site) is var bySite and not 0
            ? bySite
            : string.CompareOrdinal(a.Entry.Tag.Value, b.Entry.Tag.Value));
        if (site is not null && devices.Count == 0)
        {
            cli.Error.WriteLine($"error: --site: no device in the register is at '{site}'");
            return ExitCodes.BadInput;
        }

        if (json)
        {
            WriteJson(Visible.Exact(cli.Out), devices);
            return ExitCodes.Ok;
        }

        cli.Out.WriteLine($"Settings in force on {on:yyyy-MM-dd}.");
        for (var first = 0; first < devices.Count;)
        {
            var siteName = devices[first].Entry.Site;
            var end = first;
            while (end < devices.Count && devices[end].Entry.Site == siteName)
            {
                end++;
            }

            var count = end - first;
            cli.Out.WriteLine();
            cli.Out.WriteLine($"{siteName} ({count} device{(count == 1 ? "" : "s")})");
            var table = new TextTable(
                TextColumn.Left("Asset"), TextColumn.Left("Family"), TextColumn.Right("In"), TextColumn.Right("Poles"),
                TextColumn.Left("Settings", shortening: Shortening.End));
            for (; first < end; first++)
            {
                var d = devices[first].Entry;
                table.Add(d.Tag.Value, FamilyCodes.Of(d.Family), d.RatedCurrent.ToString(), d.Poles.ToString(CultureInfo.InvariantCulture), d.Settings.Summary);
            }

            table.WriteTo(cli.Out, wide ? int.MaxValue : Wrapped.Width);
        }

        return ExitCodes.Ok;
    }

    private static void WriteJson(TextWriter writer, List<Listed> devices)
    {
        using var output = new JsonOutput(writer);
        var json = output.Json;
        json.WriteStartArray();
        foreach (var (d, entries) in devices)
        {
            json.WriteStartObject();
            json.WriteString("asset_tag", d.Tag.Value);
            json.WriteString("site", d.Site);
            json.WriteString("location", d.Location);
            json.WriteString("family", FamilyCodes.Of(d.Family));
            json.WriteNumber("rated_current_a", d.RatedCurrent.Value);
            json.WriteNumber("poles", d.Poles);
            json.WriteNumber("rated_voltage_v", d.RatedVoltage.Value);
            json.WriteString("settings", d.Settings.Summary);
            Date(json, "settings_from", d.SettingsFrom);
            Date(json, "commissioned_on", d.CommissionedOn);
            if (d.ContactLimit is { } limit)
            {
                json.WriteNumber("contact_limit_uohm", limit.Value);
            }
            else
            {
                json.WriteNull("contact_limit_uohm");
            }

            json.WriteString("make", d.Make);
            json.WriteString("model", d.Model);
            json.WriteString("serial", d.Serial);
            json.WriteNumber("register_entries", entries);
            json.WriteEndObject();

            // Written out device by device, so a large register never sits whole in memory as JSON.
            output.Flush();
        }

        json.WriteEndArray();
        output.Raw("\n");
    }

    private static void Date(Utf8JsonWriter json, string name, DateOnly? date)
    {
        if (date is { } d)
        {
            json.WriteString(name, d.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
        }
        else
        {
            json.WriteNull(name);
        }
    }

    /// <summary>A device as listed: the register entry in force, and how many entries it has had.</summary>
    private sealed record Listed(Device Entry, int Entries);
}
