using System.Text;
using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Trends;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Reports.Charts;
using TripTestLog.Wording;
using static TripTestLog.Reports.Html.Markup;

namespace TripTestLog.Reports.Html;

/// <summary>
/// One device's page: the register entry and settings history, the time-current chart, every trip record with its
/// verdict and source, drift charts, contact and insulation results, its findings, and a sign-off block for a print.
/// </summary>
internal static class DevicePage
{
    public static string Write(DeviceReport report, ReportContext context)
    {
        var condition = report.Condition;
        var device = condition.Device;
        var html = new StringBuilder(64 * 1024);
        Layout.Begin(html, $"{device.Tag}: {device.Site}, {device.Location}",
            $"Condition {TextCodes.Grade.Of(condition.Grade)}; next as-found test due {condition.DueOn:yyyy-MM-dd}"
            + (condition.Overdue ? " (overdue)" : "") + $"; findings as of {context.AsOf:yyyy-MM-dd}", "../index.html");
        html.Append("<section class=\"device-page\">\n");
        Register(html, report);
        Chart(html, report);
        Trips(html, report.Trips, context);
        Drift(html, report);
        Contacts(html, report, context);
        Insulation(html, report, context);
        Findings(html, condition);
        SignOff(html, report, context);
        html.Append("</section>\n");
        // The sign-off carries the footer's trace (version, database), so the page prints it once.
        Layout.End(html, null);
        return html.ToString();
    }

    private static void Register(StringBuilder html, DeviceReport report)
    {
        var d = report.Condition.Device;
        html.Append("<h2>Register entry</h2>\n");
        string[][] fields =
        [
            ["asset tag", H(d.Tag.Value)], ["site", H(d.Site)], ["location", H(d.Location)], ["family", H(TextCodes.Family.Of(d.Family))],
            ["rated current In", H($"{N(d.RatedCurrent.Value)} A")], ["poles", H(N(d.Poles))], ["rated voltage", H($"{N(d.RatedVoltage.Value)} V")],
            ["commissioned", H(d.CommissionedOn?.ToString("yyyy-MM-dd") ?? "not recorded")],
            ["contact limit", H(d.ContactLimit is { } l ? ResistanceText.MicroOhms(l.Value) : "not recorded")],
            ["make, model, serial", H($"{d.Make} {d.Model} {d.Serial}".Trim())],
            ["settings in force", H(d.Settings.Summary)], ["curve table", H(d.CurveTable ?? "none")], ["ambient table", H(d.AmbientTable ?? "none")],
        ];

        // Two fields a row keeps the entry short on paper.
        Table(html, ["field", "value", "field", "value"], fields.Chunk(2).Select(pair => pair.Length == 2
            ? new[] { H(pair[0][0]), pair[0][1], H(pair[1][0]), pair[1][1] }
            : [H(pair[0][0]), pair[0][1], "", ""]), "register");
        html.Append("<h3>Settings history</h3>\n");
        Table(html, ["in force from", "settings", "curve table"], report.Records.History.Entries.Select(e => new[]
        {
            H(e.SettingsFrom?.ToString("yyyy-MM-dd") ?? "the start"), H(e.Settings.Summary), H(e.CurveTable ?? ""),
        }));
    }

    private static void Chart(StringBuilder html, DeviceReport report)
    {
        html.Append("<h2>Time-current chart</h2>\n");
        if (report.Trips.Count == 0)
        {
            html.Append("<p class=\"none\">No trip tests recorded.</p>\n");
            return;
        }

        var latest = report.Trips[^1];
        TimeCurrentChart.AppendSvg(html.Append("<figure class=\"wide\">"), latest.Envelope, report.Trips).Append("<figcaption>")
            .Append(H($"Band of the settings in force at the latest test ({latest.Envelope.Standard}, {latest.Device.Settings.Summary}), drawn for a cold "
                + (report.Trips.Any(t => t.Trip.Measurement.Start == Domain.Measurements.StartCondition.Warm)
                    ? "start and, in the warm tint with brown edges, for a warm start, both with all poles loaded: "
                    : "start with all poles loaded: ")
                + "shaded between the guaranteed edges (solid), typical edges dashed. Each test is marked at its current "
                + "over the setting in force on its date, by the verdict it got under its own conditions: filled circle pass at a standard's point, "
                + "open circle pass between points, square held without tripping, bold X too early or too late, triangle not assessable."))
            .Append("</figcaption></figure>\n");
    }

    private static void Trips(StringBuilder html, IReadOnlyList<JudgedTrip> trips, ReportContext context)
    {
        html.Append("<h2>Trip records</h2>\n");

        // ISO/IEC 17025:2017, 7.8.6: a statement of conformity names the decision rule it was made under.
        var accuracy = trips.Select(t => t.Assessment.Uncertainty?.Accuracy).OfType<string>().Distinct(StringComparer.Ordinal).ToList();
        var insulation = Domain.Instruments.InstrumentAccuracy.None.Over(context.Policy.DefaultAccuracy);
        html.Append("<p class=\"small rule\">").Append(H($"Decision rule: {DecisionText.Short(context.Policy)}."))
            .Append(H(accuracy.Count == 0 ? "" : $" Beside each verdict, U is the expanded uncertainty of the deciding time and U(I) of the test current; accuracy used: {string.Join("; ", accuracy)}."))
            .Append(H($" Insulation: the tester's accuracy from the instrument register, or where it states none the lab policy's default, ±{N(insulation.InsulationPercent)} %, k = {N(insulation.CoverageFactor)}."))
            .Append("</p>\n");
        Table(html, ["tested", "stage, pole, start", "current (x ref)", "result and band", "verdict", "basis, margin and source"], trips.Select(t =>
        {
            var m = t.Trip.Measurement;
            var a = t.Assessment;
            var verdict = TextCodes.Verdict.Of(a.Verdict);
            var band = a.Band.HasRequirement ? a.Band.Range : "no band";
            var basis = a.Basis == VerdictBasis.Normative ? "normative" + (a.Point is { } p ? " " + p.Label : "") : "band";
            return new[]
            {
                H(m.TestedAt.ToString()), H($"{TextCodes.Stage.Of(m.Stage)}, {m.Pole.Code}, {TextCodes.Start.Of(m.Start)}"),
                H($"{N(m.Current.Value, "0.##")} A ({N(m.Current.Value / t.Envelope.Reference.Value, "0.##")} x)"),
                H(m.Outcome.ToString()) + "<br>" + Small(band),
                $"<span class=\"verdict-{verdict}\">{H(verdict)}</span>{H(DecisionText.Beside(a.Uncertainty))}: {H(a.Reason)}",
                H(basis + (a.Margin.DecadesToNearerEdge is { } d ? ", " + N(d, "0.00") + " dec" : "")) + "<br>"
                    + Small(t.Trip.SourceFile + ":" + t.Trip.SourceLine.ToString(System.Globalization.CultureInfo.InvariantCulture)),
            };
        }), "trips");
    }

    // A trip test from an instrument not traceable on the day is ringed on its chart (legend "instrument not traceable");
    // a trend line drawn through it is a trip-trend-exit finding, whose text says whether it was counted.
    private static void Drift(StringBuilder html, DeviceReport report)
    {
        var points = TripPoint.Series(report.Trips).Where(p => p.Tests.Select(t => t.Trip.Measurement.TestedAt.Date).Distinct().Count() >= 2).ToList();
        html.Append("<h2>Trip drift at each test point</h2>\n");
        if (points.Count == 0)
        {
            html.Append("<p class=\"none\">No test point has as-found trips on two dates yet.</p>\n");
            return;
        }

        html.Append("<div class=\"charts\">");
        foreach (var (point, tests) in points)
        {
            var band = tests[^1].Assessment.Band;
            var exit = report.Condition.Open.FirstOrDefault(f => f.Kind == FindingKind.TripTrendExit && f.Point == point.Label);
            using var chart = DriftChart.Build(point.Label, [.. tests.Select(t => new DriftChart.Point(TrendPoint.YearOf(t.Trip.Measurement.TestedAt.Date),
                t.Trip.Measurement.Outcome.Time.Value, TimeCurrentChart.KindOf(t), ReadingHistory.Traceable(t)))], band.Minimum.Limit?.Value, band.Maximum.Limit?.Value, exit);
            ChartStyle.AppendSvg(html.Append("<figure>"), chart, 400, 260).Append("</figure>");
        }

        html.Append("</div>\n");
    }

    // The chart mark for a reading from an instrument not traceable on the day, and what the trends did with it.
    private static string UntraceableCaption(ReportContext context) =>
        "Diamond ring: instrument not traceable on the day; "
        + (context.Policy.UntraceableReadings == Domain.Condition.UntraceableReadings.Exclude ? "left out of the trend lines (" : "counted in the trend lines (")
        + UntraceableInTrendSetting(context) + ").";

    private static string UntraceableInTrendSetting(ReportContext context) => PolicyFile.Setting(context.Policy, "untraceable_readings");

    private static void Contacts(StringBuilder html, DeviceReport report, ReportContext context)
    {
        var readings = ReadingHistory.Contacts(report.Records.Contacts, context.Policy, context.Instruments).ToList();
        html.Append("<h2>Contact resistance</h2>\n");
        if (readings.Count == 0)
        {
            html.Append("<p class=\"none\">No contact resistance readings recorded.</p>\n");
            return;
        }

        var forecasts = report.Condition.Open.Where(f => f.Kind == FindingKind.ContactTrendLimit).ToList();
        using var chart = ContactChart.Build(readings, report.Condition.Device.ContactLimit?.Value, forecasts);
        ChartStyle.AppendSvg(html.Append("<figure class=\"wide contact\">"), chart).Append("<figcaption>")
            .Append(H("Each pole's median reading at each test, referred to 20 °C for copper (IEC 60228, 0.00393 per K); dotted: each pole's first "
                + "as-found reading; red: the maker's limit; dashed: a Theil–Sen trend to the date it reaches the limit."
                + (readings.Any(r => !r.Traceable) ? " " + UntraceableCaption(context) : "")))
            .Append("</figcaption></figure>\n");
        Table(html, ["tested", "stage", "pole", "at 20 °C", "as measured", "readings", "test current"], readings.Select(r => new[]
        {
            H(r.Date.ToString("yyyy-MM-dd")), H(TextCodes.Stage.Of(r.Stage)), H(r.Pole), H(ResistanceText.MicroOhms(r.CorrectedMicroOhms)),
            H(ResistanceText.MicroOhms(r.MeasuredMicroOhms) + (r.TemperatureKnown ? "" : " (no temperature)")), H(N(r.Readings)), H(N(r.TestCurrentAmperes) + " A"),
        }));
    }

    private static void Insulation(StringBuilder html, DeviceReport report, ReportContext context)
    {
        var readings = ReadingHistory.Insulation(report.Records.Insulation, context.Policy, context.Instruments).ToList();
        html.Append("<h2>Insulation resistance</h2>\n");
        if (readings.Count == 0)
        {
            html.Append("<p class=\"none\">No insulation readings recorded.</p>\n");
            return;
        }

        var none = context.Policy.InsulationCorrection == Domain.Condition.InsulationCorrectionRule.None;
        html.Append("<p class=\"small\">").Append(H((none ? "Not referred to 20 °C, by the lab policy's rule: " : "Referred to 20 °C by the lab policy's rule: ")
            + $"{ReadingHistory.InsulationCorrectionWords(context.Policy)}. A reading with no temperature is shown as measured.")).Append("</p>\n");
        var compared = none ? "compared (not corrected)" : "at 20 °C";
        Table(html, ["tested", "stage", "path", "test voltage", "as measured", "temperature", compared], readings.Select(r => new[]
        {
            H(r.Date.ToString("yyyy-MM-dd")), H(TextCodes.Stage.Of(r.Stage)), H(r.Path), H(N(r.TestVoltageVolts, "0") + " V DC"),
            H((r.OverRange ? ">" : "") + ResistanceText.MegaOhms(r.MeasuredMegaOhms)) + (r.Traceable ? "" : "<br>" + Small("instrument not traceable")),
            H(r.Celsius is { } c ? N(c, "0.#") + " °C" : "not recorded"),
            H(r.Celsius is null ? "(not corrected)" : (r.OverRange ? ">" : "") + ResistanceText.MegaOhms(r.CorrectedMegaOhms)),
        }));
    }

    private static void Findings(StringBuilder html, Application.Findings.DeviceCondition condition)
    {
        html.Append("<h2>Open findings</h2>\n");
        FindingTable(html, condition.Open);
        html.Append("<h2>Closed findings</h2>\n");
        FindingTable(html, condition.Findings.Where(f => !f.Open));
    }

    internal static void FindingTable(StringBuilder html, IEnumerable<Finding> findings) =>
        Table(html, ["severity", "kind", "concerns", "first seen", "latest test", "what to do", "requirement or policy"], findings.Select(f =>
        {
            var severity = f.Open ? TextCodes.Severity.Of(f.Severity) : "closed";
            return new[]
            {
                $"<span class=\"sev-{H(severity)}\">{H(severity)}</span>", H(TextCodes.FindingKind.Of(f.Kind)),
                H(f.Concerns),
                H(f.FirstSeen?.ToString("yyyy-MM-dd") ?? ""), H(f.TestedAt.Date.ToString("yyyy-MM-dd")),
                H(f.Message) + (f.Standing is null ? "" : $"<br><em>{H(f.Standing)}</em>"),
                H(f.Basis) + (f.Policy is null ? "" : $"<br>policy: {H(f.Policy)}"),
            };
        }));

    private static string Small(string text) => $"<span class=\"small\">{H(text)}</span>";

    private static void SignOff(StringBuilder html, DeviceReport report, ReportContext context)
    {
        html.Append("<div class=\"keep\"><h2>Sign-off</h2>\n<table class=\"signoff\"><tbody>")
            .Append("<tr><th>Tested by</th><td></td><th>Date</th><td></td></tr>")
            .Append("<tr><th>Checked by</th><td></td><th>Date</th><td></td></tr></tbody></table>\n");
        var standards = report.Trips.Select(t => t.Envelope.Standard).Distinct().ToList();
        html.Append("<p>").Append(H($"Standards: {(standards.Count == 0 ? "none (no trip tests)" : string.Join("; ", standards))}. "
            + $"Decision rule: {DecisionText.Short(context.Policy)}.")).Append("</p>\n");
        var policy = PolicyFile.Write(context.Policy).Split('\n').Where(l => l.Contains(" = ", StringComparison.Ordinal) && !l.StartsWith('#'));
        html.Append("<p>").Append(H($"Lab policy ({context.PolicyFrom}): {string.Join("; ", policy)}.")).Append("</p>\n");
        var used = report.Trips.Select(t => (t.Trip.Measurement.Instrument, t.Trip.Measurement.TestedAt.Date, Trip: true))
            .Concat(report.Records.Contacts.Select(c => (c.Measurement.Instrument, c.Measurement.TestedAt.Date, Trip: false)))
            .Where(u => u.Instrument.Length > 0)
            .GroupBy(u => u.Instrument)
            .Select(g => (Name: g.Key, Latest: g.Max(u => u.Date), Trips: g.Any(u => u.Trip), Contacts: g.Any(u => !u.Trip)))
            .OrderBy(u => u.Name, StringComparer.Ordinal);
        html.Append("<h3>Instruments</h3>\n");
        Table(html, ["instrument", "last used", "calibration on that date", "accuracy used on that date"], used.Select(u => new[]
        {
            H(u.Name), H(u.Latest.ToString("yyyy-MM-dd")),
            H(context.Instruments.PeriodOn(u.Name, u.Latest) is { } p
                ? $"{p.Kind} {p.Serial}: calibrated {p.CalibratedOn:yyyy-MM-dd}, due {p.CalibrationDue:yyyy-MM-dd}"
                : context.Instruments.Trace(u.Name, u.Latest, true)?.Message ?? ""),
            H(DecisionText.Brief(context.Policy.Decision.AccuracyOf(context.Instruments, u.Name, u.Latest), u.Trips, u.Contacts)),
        }));
        html.Append("<footer>").Append(H(context.Footer)).Append("</footer></div>\n");
    }
}
