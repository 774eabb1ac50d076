using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Reports.Html;

namespace TripTestLog.Reports.Tests;

/// <summary>The fleet page as written for three invented devices: the caution, the decision rule and the order to act in.</summary>
public sealed class FleetPageTests
{
    private static readonly DateOnly AsOf = new(2026, 12, 1);

    private static DeviceReport Report(string tag, ConditionGrade grade, DateOnly due, params Finding[] findings)
    {
        var device = Charts.C16.Latest with { Tag = AssetTag.Of(tag) };
        return new DeviceReport(new DeviceRecords(new DeviceHistory([device]), []), [], new DeviceCondition(device, grade, new DateOnly(2025, 3, 1), due, findings));
    }

    private static Finding Open(string tag, FindingKind kind, Severity severity, double value, double limit) =>
        new(kind, severity, AssetTag.Of(tag), TestedAt.OnDate(new DateOnly(2025, 3, 1)), "basis", $"{TextCodes.FindingKind.Of(kind)} on {tag}", [])
        {
            Value = new Reading(value, ReadingUnit.MicroOhms),
            Limit = new Reading(limit, ReadingUnit.MicroOhms),
        };

    // A repair (a pole over its limit) comes before a watch (an overdue device with a finding to look into); a sound
    // device has nothing to act on. The order rests on the grades' order in docs/findings.md (lab policy, no source).
    internal static string Page()
    {
        var fleet = new FleetReport(30);
        fleet.Add(Report("A-SOUND", ConditionGrade.Sound, new DateOnly(2028, 3, 1)));
        fleet.Add(Report("C-WATCH", ConditionGrade.Watch, new DateOnly(2026, 9, 1),
            Open("C-WATCH", FindingKind.ContactPoleSpread, Severity.Investigate, 60, 50),
            Open("C-WATCH", FindingKind.TestOverdue, Severity.Plan, 91, 0) with { Value = new Reading(91, ReadingUnit.Days), Limit = new Reading(0, ReadingUnit.Days) }));
        fleet.Add(Report("B-REPAIR", ConditionGrade.Repair, new DateOnly(2025, 6, 1), Open("B-REPAIR", FindingKind.ContactOverLimit, Severity.Act, 7200, 6750)));
        var context = new ReportContext("lab.db", "test", AsOf, DateTimeOffset.UnixEpoch, FindingPolicy.Default, "test policy", InstrumentRegister.Empty);
        return FleetPage.Write(fleet, context, tag => tag + ".html", "");
    }

    [Fact]
    public void TheFleetPage_ListsWorstFirst_MarksTheOverdue_AndCarriesTheCautionAndTheRule()
    {
        var page = Page();

        var act = page[page.IndexOf("<h2>Act first</h2>", StringComparison.Ordinal)..page.IndexOf("<h2>Devices by site", StringComparison.Ordinal)];
        var repair = act.IndexOf("B-REPAIR", StringComparison.Ordinal);
        var watch = act.IndexOf("C-WATCH", StringComparison.Ordinal);
        Assert.InRange(repair, 0, watch);
        Assert.Contains("2026-09-01 (overdue)", act, StringComparison.Ordinal);
        Assert.Contains("href=\"devices/B-REPAIR.html\"", act, StringComparison.Ordinal);
        Assert.Contains("Caution:", page, StringComparison.Ordinal);
        Assert.Contains("simple", page[page.IndexOf("class=\"small rule\"", StringComparison.Ordinal)..], StringComparison.Ordinal);
        Assert.Contains("database lab.db", page, StringComparison.Ordinal);
    }
}
