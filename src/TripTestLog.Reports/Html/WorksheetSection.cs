using System.Text;
using TripTestLog.Application.Worksheet;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Planning;
using TripTestLog.Domain.Settings;
using static TripTestLog.Reports.Html.Markup;

namespace TripTestLog.Reports.Html;

/// <summary>One device's part of the worksheet: the trip points in order, the contact and insulation tests, and a sign-off.</summary>
internal static class WorksheetSection
{
    public const string HowToUse =
        "Make the trip tests in the order given, each from the start shown; write the current you actually injected and the trip "
        + "time (or how long the device held) in the matching row of the trip-test CSV, then import the CSVs. Rows you leave blank "
        + "are counted as not tested and never stored. Windows are those the check applies at the reference ambient; the check "
        + "corrects thermal points for the ambient you record.";

    public static string Write(DeviceWorksheet sheet)
    {
        var d = sheet.Device;
        var html = new StringBuilder();
        html.Append("<section class=\"device-page\"><h2>").Append(H(d.Tag.Value)).Append("</h2>\n<p>")
            .Append(H($"{d.Site}, {d.Location}. {FamilyCodes.Of(d.Family)}, In {d.RatedCurrent}, {d.Poles} pole{(d.Poles == 1 ? "" : "s")}, "
                + $"{d.RatedVoltage}; settings in force: {d.Settings.Summary}. Judged to {sheet.Envelope.Standard}. Stage: {TextCodes.Stage.Of(sheet.Stage)}."))
            .Append("</p>\n");

        html.Append("<h3>Trip tests</h3>\n");
        if (sheet.NoTrips is { } none)
        {
            html.Append("<p class=\"none\">").Append(H($"No trip tests planned: {none}.")).Append("</p>\n");
        }
        else
        {
            Table(html, ["Row", "Point", "Inject", "Start", "Poles loaded", "Passes if", "Basis", "Time tested", "Current injected", "Trip time or held", "Result"],
                sheet.Trips.Select((t, i) => Trip(sheet, t, i)), "worksheet");
        }

        html.Append("<h3>Contact resistance</h3>\n");
        Table(html, ["Row", "Pole", "Test current (DC)", "Limit", "Basis", "Time tested", "Reading", "Temperature", "Result"],
            sheet.Contacts.Select((c, i) => new string?[]
            {
                H(DeviceWorksheet.RowLabel('C', i)), H(c.Pole.Code), H(c.TestCurrent.ToString()),
                c.Limit is { } l ? H(l.ToString()) : "<span class=\"none\">none in the register</span>", Small(c.Basis), Entry, Entry, Entry, Tick,
            }), "worksheet");

        html.Append("<h3>Insulation resistance</h3>\n");
        Table(html, ["Row", "Path", "Test voltage (DC)", "Minimum", "Reading after", "Basis", "Time tested", "Reading", "Temperature", "Result"],
            sheet.Insulation.Select((p, i) => new string?[]
            {
                H(DeviceWorksheet.RowLabel('I', i)), H(p.Path), p.TestVoltage is { } v ? H(v.ToString()) : "<span class=\"none\">from the maker</span>",
                p.Minimum is { } m ? H(m.ToString()) : "<span class=\"none\">from the maker</span>", H(PlannedTrip.Duration(PlannedInsulation.Duration)),
                Small(p.Basis), Entry, Entry, Entry, Tick,
            }), "worksheet");

        html.Append("<table class=\"signoff\"><tbody><tr><th>Tested by</th><td></td><th>Date</th><td></td></tr>")
            .Append("<tr><th>Checked by</th><td></td><th>Date</th><td></td></tr>")
            .Append("<tr><th>Instruments (ID)</th><td></td><th>Ambient</th><td></td></tr></tbody></table>\n</section>\n");
        return html.ToString();
    }

    // A box to write a result in.
    private const string? Entry = null;

    // Ticked by hand beside the window: the result as the technician reads it at the bench.
    private const string Tick = "<span class=\"tick\">\u2610 pass \u2610 fail</span>";

    private static string?[] Trip(DeviceWorksheet sheet, PlannedTrip t, int index)
    {
        var start = t.Conditions.Start == StartCondition.Warm
            ? t.StraightAfterPrevious ? $"warm: straight after {DeviceWorksheet.RowLabel('T', index - 1)}, no cooling" : "warm"
            : Heats(sheet.Trips, index - 1)
                ? $"cold: rest {LabPolicy.ColdRest.TotalMinutes:0} min after {DeviceWorksheet.RowLabel('T', index - 1)} ends (lab policy)"
                : "cold (device at ambient)";
        var poles = t.Conditions.Loading == PoleLoading.OnePole ? "one pole only (pole 1)" : sheet.Device.Poles == 1 ? "the pole" : "all poles in series";

        // A drawn curve says nothing useful about a no-trip test, so its advisory is shown only where a trip is expected.
        var passes = H(t.Acceptance) + (t.Typical is { } typical && t.HoldFor is null ? "<br>" + Small(typical) : "");
        return
        [
            H(DeviceWorksheet.RowLabel('T', index)), H(t.Label),
            H($"{t.Current} ({t.Multiple.Value:0.###} {sheet.Envelope.ReferenceName})"), H(start), H(poles), passes, Small(t.Basis), Entry, Entry, Entry, Tick,
        ];
    }

    // The test before may carry current long enough to warm a thermal release: a hold, a warm start, or a window reaching
    // past the policy's heating time (the same rule the check applies to a test marked cold).
    private static bool Heats(IReadOnlyList<PlannedTrip> trips, int index)
    {
        if (index < 0)
        {
            return false;
        }

        var t = trips[index];
        return t.HoldFor is not null || t.Conditions.Start == StartCondition.Warm
            || t.Window.Maximum.Limit is not { } max || max.Value >= LabPolicy.HeatingTestSeconds;
    }

    private static string Small(string text) => $"<span class=\"small\">{H(text)}</span>";
}
