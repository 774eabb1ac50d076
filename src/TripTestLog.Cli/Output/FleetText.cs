using System.Globalization;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Wording;

namespace TripTestLog.Cli.Output;

/// <summary>`fleet` for people: devices by site and grade, then the priority list with the reason in words, within 100 columns.</summary>
internal static class FleetText
{
    private static readonly ConditionGrade[] Grades = Enum.GetValues<ConditionGrade>();

    public static void Write(TextWriter writer, FleetSummary fleet, string asOf, string policyFrom, FleetModels? models = null)
    {
        Wrapped.Write(writer, $"Fleet condition as of {asOf} (policy: {policyFrom})", 0);
        writer.WriteLine();
        // Headers are the grade codes themselves; the site column gives up width to keep the table within 100 columns.
        var counts = new TextTable(
            [TextColumn.Left("site", shortening: Shortening.Front), TextColumn.Right("devices"), .. Grades.Select(g => TextColumn.Right(Head(TextCodes.Grade.Of(g)))), TextColumn.Right("overdue")]);
        foreach (var (site, c) in fleet.Sites)
        {
            counts.Add([site, N(c.Devices), .. c.ByGrade.Select(N), N(c.Overdue)]);
        }

        var all = fleet.Sites.Values;
        counts.Add(["all sites", N(all.Sum(c => c.Devices)), .. Grades.Select(g => N(all.Sum(c => c.ByGrade[(int)g]))), N(all.Sum(c => c.Overdue))]);
        counts.WriteTo(writer);
        writer.WriteLine();
        writer.WriteLine("Grades: sound (nothing open), watch (look into it), plan-work (a trend or change needs work),");
        writer.WriteLine("untested (no as-found test on record), repair (over a limit or out of band),");
        writer.WriteLine("take-out-of-service (may not protect its circuit).");
        writer.WriteLine();

        var lines = fleet.Lines;
        if (lines.Count == 0)
        {
            writer.WriteLine("No device needs attention.");
        }
        else
        {
            Wrapped.Write(writer, "Act first: worst grade; within a grade, the most critical (register criticality 1 first, 2 when not given); "
                + "then furthest past its limit (as a fraction of the limit); then the soonest date, a forecast or the due date. "
                + "Devices with one cause share a line.", 0);
            writer.WriteLine();
            // Nothing shortens here: a tag is shown whole, and the due column is as wide as "yyyy-MM-dd (overdue)".
            var priority = new TextTable(TextColumn.Right("#"), TextColumn.Left("asset"), TextColumn.Left("grade"), TextColumn.Left("due", 20));
            foreach (var (line, i) in lines.Select((l, i) => (l, i + 1)))
            {
                var first = line.Devices[0];
                priority.Add([N(i), first.Device.Tag.Value, TextCodes.Grade.Of(first.Grade), Due(first)], Why(line));
            }

            priority.WriteTo(writer);
        }

        if (models is not null)
        {
            writer.WriteLine();
            FleetModelsOutput.WriteText(writer, models);
        }

        writer.WriteLine();
        Wrapped.Write(writer, Safety.Caution, 0);
    }

    /// <summary>The due date with an "(overdue)" marker when its test is overdue.</summary>
    public static string Due(DeviceCondition device) =>
        device.DueOn.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture) + (device.Overdue ? " (overdue)" : "");

    /// <summary>
    /// A priority line's reason: for one device its worst open finding's kind, subject, how far past its limit, and how
    /// many more findings; for devices sharing a cause, the cause and the devices it names.
    /// </summary>
    public static string Why(PriorityLine line)
    {
        ArgumentNullException.ThrowIfNull(line);
        if (line.Cause is null)
        {
            return Why(line.Devices[0]);
        }

        var kind = line.Devices[0].WorstOpen is { } worst ? TextCodes.FindingKind.Of(worst.Kind) : "";
        return $"{kind}, one cause ({line.Cause}) on {line.Devices.Count} devices: {string.Join(", ", line.Devices.Select(d => d.Device.Tag.Value))}";
    }

    /// <summary>The worst open finding's kind and subject, how far past its limit, and how many more findings there are.</summary>
    public static string Why(DeviceCondition device)
    {
        ArgumentNullException.ThrowIfNull(device);
        if (device.WorstOpen is not { } worst)
        {
            return "";
        }

        var more = device.Open.Count() - 1;
        if (device.Grade == ConditionGrade.Untested && worst.Kind == FindingKind.TestOverdue)
        {
            return $"never tested; due since {device.DueOn:yyyy-MM-dd}" + Critical(device) + (more switch { 0 => "", 1 => " (and 1 more finding)", _ => $" (and {more} more findings)" });
        }

        var subject = worst.Concerns.Length == 0 ? "" : " " + worst.Concerns;
        var forecast = worst.ForecastOn is { } on ? $" by {on:yyyy-MM}" : "";
        var margin = DeviceCondition.MarginOf(worst) is { } m && m >= 0.0005 ? string.Create(CultureInfo.InvariantCulture, $", {m * 100:0.#} % past its limit") : "";
        return $"{TextCodes.FindingKind.Of(worst.Kind)}{subject}{forecast}{margin}{Critical(device)}"
            + (more switch { 0 => "", 1 => " (and 1 more finding)", _ => $" (and {more} more findings)" });
    }

    /// <summary>", criticality N" when the register sets one other than the default, since it placed the line.</summary>
    public static string Critical(DeviceCondition device)
    {
        ArgumentNullException.ThrowIfNull(device);
        return device.Device.Criticality == Domain.Devices.Device.DefaultCriticality
            ? ""
            : string.Create(CultureInfo.InvariantCulture, $", criticality {device.Device.Criticality}");
    }

    // The longest grade word is broken after its second hyphen over two header lines, so the table keeps 100 columns.
    private static string Head(string grade) => grade == "take-out-of-service" ? "take-out-\nof-service" : grade;

    private static string N(int n) => n.ToString(CultureInfo.InvariantCulture);
}
