using System.Globalization;
using System.Text.Json;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;

namespace TripTestLog.Cli.Output;

/// <summary>`fleet --json`: one object with the counts by site and grade and the priority list; fields in the README.</summary>
internal static class FleetJson
{
    public static void Write(TextWriter writer, FleetSummary fleet, string asOf, string policyFrom, FleetModels? models = null)
    {
        using var output = new JsonOutput(writer);
        var json = output.Json;
        json.WriteStartObject();
        json.WriteString("as_of", asOf);
        json.WriteString("policy", policyFrom);
        json.WriteStartArray("sites");
        foreach (var (site, c) in fleet.Sites)
        {
            json.WriteStartObject();
            json.WriteString("site", site);
            json.WriteNumber("devices", c.Devices);
            foreach (var grade in Enum.GetValues<ConditionGrade>())
            {
                json.WriteNumber(TextCodes.Grade.Of(grade), c.ByGrade[(int)grade]);
            }

            json.WriteNumber("overdue", c.Overdue);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("priority");
        var shared = new Dictionary<object, string>(ReferenceEqualityComparer.Instance);
        foreach (var (d, cause) in fleet.Lines.Where(l => l.Cause is not null).SelectMany(l => l.Devices.Select(d => (d, l.Cause!))))
        {
            shared[d] = cause;
        }

        foreach (var (device, rank) in fleet.Priority.Select((d, i) => (d, i + 1)))
        {
            json.WriteStartObject();
            json.WriteNumber("rank", rank);
            json.WriteString("asset_tag", device.Device.Tag.Value);
            json.WriteString("site", device.Device.Site);
            json.WriteString("grade", TextCodes.Grade.Of(device.Grade));
            json.WriteString("due_on", device.DueOn.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
            json.WriteBoolean("overdue", device.Overdue);
            json.WriteNumber("criticality", device.Device.Criticality);
            if (device.SoonestForecast is { } on)
            {
                json.WriteString("soonest_forecast", on.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
            }
            else
            {
                json.WriteNull("soonest_forecast");
            }

            json.WriteString("why", FleetText.Why(device));
            json.WriteStartArray("open_kinds");
            foreach (var kind in device.Open.Select(f => f.Kind).Distinct())
            {
                json.WriteStringValue(TextCodes.FindingKind.Of(kind));
            }

            json.WriteEndArray();
            if (device.WorstOpen is { } worst && worst.Kind != FindingKind.TestOverdue && DeviceCondition.MarginOf(worst) is { } margin)
            {
                json.WriteNumber("margin_percent", Math.Round(margin * 100, 2));
            }
            else
            {
                json.WriteNull("margin_percent");
            }

            if (shared.TryGetValue(device, out var cause))
            {
                json.WriteString("shared_cause", cause);
            }
            else
            {
                json.WriteNull("shared_cause");
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
        if (models is not null)
        {
            FleetModelsOutput.WriteJson(json, models);
        }

        json.WriteEndObject();

        output.Raw("\n");
    }
}
