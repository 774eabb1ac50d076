using System.Text;
using TripTestLog.Application.Findings;
using TripTestLog.Application.Text;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Reports.Charts;
using TripTestLog.Wording;
using static TripTestLog.Reports.Html.Markup;

namespace TripTestLog.Reports.Html;

/// <summary>
/// The fleet page for the asset manager: counts by site and grade with a chart, the priority list with the reason in
/// words, overdue devices, the biggest drifts and soonest forecasts, results per family and rating, and the
/// instruments used while untraceable.
/// </summary>
internal static class FleetPage
{
    public static string Write(FleetReport fleet, ReportContext context, Func<string, string?> pageOf, string selection)
    {
        var html = new StringBuilder(64 * 1024);
        var sites = fleet.Summary.Sites;
        var devices = sites.Values.Sum(s => s.Devices);
        Layout.Begin(html, "Fleet condition", $"{Counted.Of(devices, "device")} at {Counted.Of(sites.Count, "site")}{selection}; findings as of {context.AsOf:yyyy-MM-dd}", null);
        html.Append("<nav>Data beside this page: <a href=\"findings.csv\">findings.csv</a> <a href=\"findings.json\">findings.json</a> ")
            .Append("<a href=\"verdicts.csv\">verdicts.csv</a> <a href=\"verdicts.json\">verdicts.json</a></nav>\n");
        // ISO/IEC 17025:2017, 7.8.6: the rule every verdict on these pages was given under, and where its accuracies came from.
        html.Append("<p class=\"small rule\">").Append(H(DecisionText.Rule(context.Policy)));
        if (DecisionText.Defaults(context.Instruments, context.Policy) is { } defaults)
        {
            html.Append(' ').Append(H(defaults));
        }

        html.Append("</p>\n");
        html.Append("<h2>Act first</h2>\n<p class=\"sub\">Worst grade first; within a grade, the most critical (register "
            + "criticality 1 first, 2 when not given), then furthest past its limit, then the soonest date.</p>\n");
        Table(html, ["#", "device", "site", "grade", "next test due", "why it is here"], fleet.Summary.Priority.Select((d, i) => new[]
        {
            N(i + 1), Link(d, pageOf), H(d.Device.Site), Badge(d.Grade),
            H(d.DueOn.ToString("yyyy-MM-dd")) + (d.Overdue ? " (overdue)" : ""), H(Why(d)),
        }));

        var grades = Enum.GetValues<ConditionGrade>();
        html.Append("<h2>Devices by site and condition grade</h2>\n");
        Table(html, ["site", "devices", .. grades.Select(g => TextCodes.Grade.Of(g)), "overdue"],
            sites.Select(s => (string[])[H(s.Key), N(s.Value.Devices), .. s.Value.ByGrade.Select(n => N(n)), N(s.Value.Overdue)])
                .Append(["all sites", N(devices), .. grades.Select(g => N(sites.Values.Sum(s => s.ByGrade[(int)g]))), N(sites.Values.Sum(s => s.Overdue))]));
        var totals = grades.Select(g => sites.Values.Sum(s => s.ByGrade[(int)g])).ToList();
        using var chart = GradeChart.Build(totals);
        ChartStyle.AppendSvg(html.Append("<figure class=\"wide\">"), chart, 640, 300).Append("<figcaption>")
            .Append(H("Grades: sound, nothing open; watch, look into it; plan-work, a trend or change needs work; untested, no as-found test on record; repair, over a limit or out of "
                + "band; take-out-of-service, may not protect its circuit until repaired and retested."))
            .Append("</figcaption></figure>\n");

        html.Append("<h2>Overdue for test</h2>\n");
        Table(html, ["device", "site", "last as-found test", "was due", "days overdue"], fleet.Overdue.Select(d => new[]
        {
            Link(d, pageOf), H(d.Device.Site), H(d.LastTested?.ToString("yyyy-MM-dd") ?? "never"), H(d.DueOn.ToString("yyyy-MM-dd")),
            N(context.AsOf.DayNumber - d.DueOn.DayNumber),
        }));

        html.Append("<h2>Biggest drifts</h2>\n");
        Table(html, ["device", "test point", "change", "what moved"], fleet.Drifts.Select(x => new[]
        {
            Link(x.Device, pageOf), H(x.Finding.Point ?? ""), H(x.Finding.Value is { } v ? N(v.Amount, "+0;-0") + " %" : ""), H(x.Finding.Message),
        }));
        html.Append("<h2>Forecast exits and limits</h2>\n");
        Table(html, ["device", "kind", "concerns", "forecast date", "what to do"], fleet.Forecasts.Select(x => new[]
        {
            Link(x.Device, pageOf), H(TextCodes.FindingKind.Of(x.Finding.Kind)),
            H(x.Finding.Concerns),
            H(x.Finding.ForecastOn?.ToString("yyyy-MM-dd") ?? ""), H(x.Finding.Message),
        }));

        html.Append("<h2>Trip results per family and rating</h2>\n");
        Table(html, ["family", "rating", "tests", "pass", "too early", "too late", "not assessable"], fleet.Results.Select(r => new[]
        {
            H(TextCodes.Family.Of(r.Key.Family)), H(N(r.Key.Rating) + " A"), N(r.Value.Sum()), N(r.Value[(int)Verdict.Pass]), N(r.Value[(int)Verdict.TooEarly]),
            N(r.Value[(int)Verdict.TooLate]), N(r.Value[(int)Verdict.NotAssessable]),
        }));

        html.Append("<h2>Instruments used while untraceable</h2>\n");
        Table(html, ["instrument", "records touched", "devices", "why"], fleet.Lapses.Select(l => new[]
        {
            H(l.Key), N(l.Value.Records), N(l.Value.Devices), H(l.Value.Latest?.Message ?? ""),
        }));
        FleetModelsSection.Write(html, fleet.Models);
        Layout.End(html, context.Footer);
        return html.ToString();
    }

    /// <summary>A grade as a badge in the grade chart's colour, its word kept for a print in black and white.</summary>
    internal static string Badge(ConditionGrade grade)
    {
        var code = H(TextCodes.Grade.Of(grade));
        return $"<span class=\"grade grade-{code}\">{code}</span>";
    }

    /// <summary>The worst open finding in words, and how many more there are.</summary>
    private static string Why(DeviceCondition device)
    {
        var more = device.Open.Count() - 1;
        var critical = device.Device.Criticality == Device.DefaultCriticality ? "" : $" (criticality {device.Device.Criticality})";
        return device.WorstOpen is { } worst ? worst.Message + critical + (more switch { 0 => "", 1 => " (and 1 more finding)", _ => $" (and {more} more findings)" }) : "";
    }

    private static string Link(DeviceCondition device, Func<string, string?> pageOf) =>
        pageOf(device.Device.Tag.Value) is { } page ? $"<a href=\"{Href("devices", page)}\">{H(device.Device.Tag.Value)}</a>" : H(device.Device.Tag.Value);
}
