using System.Globalization;
using System.Text.Json;
using TripTestLog.Application.Findings;

namespace TripTestLog.Cli.Output;

/// <summary>
/// "Which models fail" for `fleet`: a text table, a JSON member and a CSV file, all from one <see cref="FleetModels"/>;
/// fields in docs/findings.md. A group below the policy's minimum of devices gets its counts and no figure.
/// </summary>
internal static class FleetModelsOutput
{
    private static IEnumerable<(string Grouping, string Group, FleetModels.Counts Counts)> Rows(FleetModels models) =>
        models.Models.Select(m => ("make-model", $"{m.Key.Make} {m.Key.Model}".Trim(), m.Value))
            .Concat(models.AgeBands.Select(a => ("age-band", FleetModels.BandName(a.Key), a.Value)));

    public static void WriteText(TextWriter writer, FleetModels models)
    {
        Wrapped.Write(writer, $"Which models fail: devices with an as-found trip test from {models.From:yyyy-MM-dd} to {models.To:yyyy-MM-dd}, "
            + $"and how many had one outside its band, with a 95 % Wilson score interval (Wilson 1927); contact rise is the mean of each device's "
            + $"poles at 20 °C, first to latest as-found test. No figure for fewer than {models.MinimumDevices} devices.", 0);
        writer.WriteLine();
        var table = new TextTable(
            TextColumn.Left("group", shortening: Shortening.Front), TextColumn.Right("devices"), TextColumn.Right("tested"), TextColumn.Right("failed"),
            TextColumn.Right("failure rate (95 %)"), TextColumn.Right("rise µΩ/y"), TextColumn.Right("of"));
        foreach (var (grouping, group, c) in Rows(models))
        {
            table.Add(grouping == "age-band" ? "age " + group : group, N(c.Devices), N(c.Tested), N(c.Failed),
                c.Rate(models.MinimumDevices) is { } r ? Invariant($"{r.Proportion * 100:0} % ({r.Lower * 100:0}-{r.Upper * 100:0})") : "too few",
                c.MeanRise(models.MinimumDevices) is { } rise ? Invariant($"{rise:+0;-0}") : "too few", N(c.RiseDevices));
        }

        table.WriteTo(writer);
    }

    public static void WriteJson(Utf8JsonWriter json, FleetModels models)
    {
        json.WriteStartObject("models");
        json.WriteString("window_from", models.From.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
        json.WriteString("window_to", models.To.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
        json.WriteNumber("min_devices", models.MinimumDevices);
        json.WriteStartArray("groups");
        foreach (var (grouping, group, c) in Rows(models))
        {
            json.WriteStartObject();
            json.WriteString("grouping", grouping);
            json.WriteString("group", group);
            json.WriteNumber("devices", c.Devices);
            json.WriteNumber("tested", c.Tested);
            json.WriteNumber("failed", c.Failed);
            if (c.Rate(models.MinimumDevices) is { } r)
            {
                json.WriteNumber("failure_rate", Math.Round(r.Proportion, 4));
                json.WriteNumber("wilson_low", Math.Round(r.Lower, 4));
                json.WriteNumber("wilson_high", Math.Round(r.Upper, 4));
            }
            else
            {
                json.WriteNull("failure_rate");
                json.WriteNull("wilson_low");
                json.WriteNull("wilson_high");
            }

            if (c.MeanRise(models.MinimumDevices) is { } rise)
            {
                json.WriteNumber("contact_rise_uohm_per_year", Math.Round(rise, 1));
            }
            else
            {
                json.WriteNull("contact_rise_uohm_per_year");
            }

            json.WriteNumber("contact_rise_devices", c.RiseDevices);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    /// <summary>The same groups as CSV, one row each, the JSON's field names as the header; an empty cell where no figure is given.</summary>
    public static void WriteCsv(TextWriter writer, FleetModels models)
    {
        var csv = new CsvOutput(writer);
        csv.Header(["grouping", "group", "devices", "tested", "failed", "failure_rate", "wilson_low", "wilson_high", "contact_rise_uohm_per_year",
            "contact_rise_devices", "window_from", "window_to"]);
        foreach (var (grouping, group, c) in Rows(models))
        {
            var r = c.Rate(models.MinimumDevices);
            var rise = c.MeanRise(models.MinimumDevices);
            csv.Cell(grouping).Cell(group).Cell(c.Devices).Cell(c.Tested).Cell(c.Failed)
                .Cell(r is { } a ? Math.Round(a.Proportion, 4) : null).Cell(r is { } b ? Math.Round(b.Lower, 4) : null)
                .Cell(r is { } d ? Math.Round(d.Upper, 4) : null).Cell(rise is { } e ? Math.Round(e, 1) : null).Cell(c.RiseDevices)
                .Cell(models.From.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)).Cell(models.To.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture))
                .EndRow();
        }
    }

    private static string N(int n) => n.ToString(CultureInfo.InvariantCulture);

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
