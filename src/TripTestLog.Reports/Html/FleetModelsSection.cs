using System.Text;
using TripTestLog.Application.Findings;
using static TripTestLog.Reports.Html.Markup;

namespace TripTestLog.Reports.Html;

/// <summary>
/// The fleet page's "which models fail" block, on its own so the page can place it where it likes: as-found failure
/// rate by make and model and by age band, with its 95 % Wilson interval, the mean contact resistance rise a year, and
/// the devices each figure rests on; no figure below the policy's minimum of devices.
/// </summary>
internal static class FleetModelsSection
{
    public static void Write(StringBuilder html, FleetModels? models)
    {
        if (models is null)
        {
            return;
        }

        html.Append("<section class=\"models\">\n<h2>Which models fail</h2>\n<p class=\"sub\">")
            .Append(H($"Devices with an as-found trip test from {models.From:yyyy-MM-dd} to {models.To:yyyy-MM-dd}, and how many of them had one "
                + $"outside its band, with a 95 % Wilson score interval (Wilson 1927). No figure for fewer than {models.MinimumDevices} devices "
                + "(lab policy fleet_min_devices). Contact rise: mean of each device's pole readings at 20 °C, first to latest as-found test."))
            .Append("</p>\n");
        string[] headers = ["", "devices", "tested", "failed", "failure rate (95 % interval)", "contact rise a year (devices)"];
        Table(html, ["make and model", .. headers[1..]], models.Models.Select(m => Row(H($"{m.Key.Make} {m.Key.Model}".Trim()), m.Value, models.MinimumDevices)));
        Table(html, ["age since commissioning", .. headers[1..]], models.AgeBands.Select(a => Row(H(FleetModels.BandName(a.Key)), a.Value, models.MinimumDevices)));
        html.Append("</section>\n");
    }

    private static string[] Row(string name, FleetModels.Counts c, int minimum) =>
    [
        name, N(c.Devices), N(c.Tested), N(c.Failed),
        c.Rate(minimum) is { } r ? H($"{N(r.Proportion * 100, "0.0")} % ({N(r.Lower * 100, "0.0")} to {N(r.Upper * 100, "0.0")} %)") : "too few to say",
        c.MeanRise(minimum) is { } rise ? H($"{N(rise, "+0;-0")} µΩ ({N(c.RiseDevices)})") : H($"too few to say ({N(c.RiseDevices)})"),
    ];
}
