using System.Text;
using TripTestLog.Application.Worksheet;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Planning;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Verdicts;
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

    /// <summary>
    /// Under the guarded rule, what the second line of each "Passes if" cell is; null under any other rule. The worksheet is
    /// written before the instrument is chosen, so the guard bands use the policy's default accuracies.
    /// </summary>
    public static string? GuardedNote(DecisionPolicy decision)
    {
        if (decision.Rule != DecisionRule.Guarded)
        {
            return null;
        }

        var accuracy = InstrumentAccuracy.None.Over(decision.Defaults);
        var w = decision.GuardBandFactor == 1 ? "w = U" : $"w = {N(decision.GuardBandFactor)} x U";
        return $"Decision rule: guarded (ILAC-G8:09/2019), guard band {w}. Under each trip window, \"guarded\" gives the window a trip "
            + "must fall in to pass under this rule: each limit moved inward by w, with U the expanded uncertainty of a trip at that limit "
            + $"at the planned current, from the lab policy's default accuracies ({accuracy.Words(true, true, false, false)}); an instrument whose "
            + "register entry states a better accuracy narrows it when the result is checked. A result inside the plain window but outside "
            + "the guarded one is not assessable (within the measurement uncertainty of the limit): tick \"within U\" and retest with a more "
            + "accurate instrument.";
    }

    public static string Write(DeviceWorksheet sheet, DecisionPolicy decision)
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
                sheet.Trips.Select((t, i) => Trip(sheet, t, i, decision)), "worksheet");
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

    private static string?[] Trip(DeviceWorksheet sheet, PlannedTrip t, int index, DecisionPolicy decision)
    {
        var start = t.Conditions.Start == StartCondition.Warm
            ? t.StraightAfterPrevious ? $"warm: straight after {DeviceWorksheet.RowLabel('T', index - 1)}, no cooling" : "warm"
            : Heats(sheet.Trips, index - 1)
                ? $"cold: rest {LabPolicy.ColdRest.TotalMinutes:0} min after {DeviceWorksheet.RowLabel('T', index - 1)} ends (lab policy)"
                : "cold (device at ambient)";
        var poles = t.Conditions.Loading == PoleLoading.OnePole ? "one pole only (pole 1)" : sheet.Device.Poles == 1 ? "the pole" : "all poles in series";

        // A drawn curve says nothing useful about a no-trip test, so its advisory is shown only where a trip is expected.
        var passes = H(t.Acceptance) + (decision.Rule == DecisionRule.Guarded ? "<br>" + Guarded(sheet, t, decision) : "")
            + (t.Typical is { } typical && t.HoldFor is null ? "<br>" + Small(typical) : "");
        return
        [
            H(DeviceWorksheet.RowLabel('T', index)), H(t.Label),
            H($"{t.Current} ({t.Multiple.Value:0.###} {sheet.Envelope.ReferenceName})"), H(start), H(poles), passes, Small(t.Basis), Entry, Entry, Entry,
            decision.Rule == DecisionRule.Guarded && t.HoldFor is null && t.Window.HasRequirement ? GuardedTick : Tick,
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

    // The guarded rule has a third outcome: within the measurement uncertainty of the limit.
    private const string GuardedTick = "<span class=\"tick\">\u2610 pass \u2610 within U \u2610 fail</span>";

    // The window a trip must fall in to pass under the guarded rule, beside the plain one; for a hold, how long it must
    // last: the point's time and the guard band on the time held.
    private static string Guarded(DeviceWorksheet sheet, PlannedTrip t, DecisionPolicy decision)
    {
        if (t.HoldFor is { } need)
        {
            var hold = TripJudge.GuardedHold(need, InstrumentAccuracy.None.Over(decision.Defaults), decision.GuardBandFactor);
            return "<strong>" + H($"guarded: hold at least {T(hold.Value, up: true)}") + "</strong> "
                + Small($"(w = {T(hold.Value - need.Value, up: true)} on the time held)");
        }

        if (!t.Window.HasRequirement || t.Window.Minimum.Limit is null)
        {
            return Small("guarded: as above (no time limit to guard)");
        }

        var accuracy = InstrumentAccuracy.None.Over(decision.Defaults);
        var g = TripJudge.GuardedWindowOf(sheet.Envelope, t.Current, t.Conditions, t.Window, accuracy, decision.GuardBandFactor);
        if (g.Minimum is null && g.Maximum is null)
        {
            return Small("guarded: as above (no time limit to guard)");
        }

        if (g.Closed)
        {
            return "<strong>" + H("guarded: no trip time passes with the default accuracy") + "</strong>";
        }

        var min = g.Minimum is { } n ? $"after {T(n.Value, up: true)}" : null;
        var max = g.Maximum is { } x ? $"before {T(x.Value, up: false)}" : null;
        var window = (min, max) switch
        {
            ({ } a, { } b) => $"trip {a} and {b}",
            ({ } a, null) => $"trip {a}",
            (null, { } b) => $"trip {b}",
            _ => "",
        };
        var bands = string.Join(", ", new[] { g.MinimumBand is { } wn ? $"w = {T(wn, up: true)} at the minimum" : null, g.MaximumBand is { } wx ? $"w = {T(wx, up: true)} at the maximum" : null }
            .OfType<string>());
        return "<strong>" + H($"guarded: {window}") + "</strong> " + Small($"({bands})");
    }

    // A guarded limit for a person, rounded the safe way (a minimum and a band up, a maximum down): seconds to three or four
    // significant figures, minutes and whole seconds past ten minutes.
    private static string T(double seconds, bool up)
    {
        var step = seconds >= 100 ? 1 : seconds >= 10 ? 0.1 : seconds >= 1 ? 0.01 : 0.001;
        var r = (up ? Math.Ceiling(seconds / step - 1e-9) : Math.Floor(seconds / step + 1e-9)) * step;
        return r >= 600 ? $"{N(Math.Floor(r / 60), "0")} min {N(r % 60, "0")} s" : N(r, "0.###") + " s";
    }

    private static string Small(string text) => $"<span class=\"small\">{H(text)}</span>";
}
