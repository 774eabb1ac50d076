using System.Globalization;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;

namespace TripTestLog.Cli.Output;

/// <summary>`fleet` for people: devices by site and grade, then the priority list with the reason in words, within 100 columns.</summary>
internal static class FleetText
{
    private static readonly ConditionGrade[] Grades = Enum.GetValues<ConditionGrade>();

    public static void Write(TextWriter writer, FleetSummary fleet, string asOf, string policyFrom)
    {
        Wrapped.Write(writer, $"Fleet condition as of {asOf} (policy: {policyFrom})", 0);
        writer.WriteLine();
        var counts = new TextTable(["site", "devices>", .. Grades.Select(g => Short(g) + ">"), "overdue>"]);
        foreach (var (site, c) in fleet.Sites)
        {
            counts.Add([Fit(site, 28), N(c.Devices), .. c.ByGrade.Select(N), N(c.Overdue)]);
        }

        var all = fleet.Sites.Values;
        counts.Add(["all sites", N(all.Sum(c => c.Devices)), .. Grades.Select(g => N(all.Sum(c => c.ByGrade[(int)g]))), N(all.Sum(c => c.Overdue))]);
        counts.WriteTo(writer);
        writer.WriteLine();
        writer.WriteLine("Grades: sound (nothing open), watch (look into it), plan-work (a trend or change needs work),");
        writer.WriteLine("repair (over a limit or out of band), take-out-of-service (may not protect its circuit).");
        writer.WriteLine();

        var priority = fleet.Priority;
        if (priority.Count == 0)
        {
            writer.WriteLine("No device needs attention.");
        }
        else
        {
            writer.WriteLine("Act first: worst grade, then soonest forecast, then overdue.");
            var table = new TextTable("#>", "asset", "grade", "due", "why");
            foreach (var (device, i) in priority.Select((d, i) => (d, i + 1)))
            {
                table.Add(N(i), device.Device.Tag.Value, TextCodes.Grade.Of(device.Grade), device.DueOn.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
                    Fit(Why(device), 46));
            }

            table.WriteTo(writer);
        }

        writer.WriteLine();
        Wrapped.Write(writer, Safety.Caution, 0);
    }

    /// <summary>The worst open finding's kind and subject, and how many more there are.</summary>
    public static string Why(DeviceCondition device)
    {
        if (device.WorstOpen is not { } worst)
        {
            return "";
        }

        var more = device.Open.Count() - 1;
        var subject = worst.Concerns.Length == 0 ? "" : " " + worst.Concerns;
        var forecast = worst.ForecastOn is { } on ? $" by {on:yyyy-MM}" : "";
        return $"{TextCodes.FindingKind.Of(worst.Kind)}{subject}{forecast}" + (more > 0 ? $" +{more}" : "");
    }

    private static string Short(ConditionGrade grade) => grade == ConditionGrade.TakeOutOfService ? "out-of-service" : TextCodes.Grade.Of(grade);

    private static string N(int n) => n.ToString(CultureInfo.InvariantCulture);

    private static string Fit(string text, int width) => text.Length <= width ? text : text[..(width - 3)] + "...";
}
