using System.Globalization;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Planning;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Worksheet;

/// <summary>
/// Plans one device's tests from its register entry in force on a date and the lab policy: the trip points and windows of
/// <see cref="TripTestPlan"/> (from the same envelope the check uses, at the reference ambient), a contact test per pole at
/// the policy's test current, and an insulation test per path at the policy table's voltage.
/// </summary>
public static class WorksheetPlanner
{
    /// <summary>The worksheet of <paramref name="history"/>'s device on <paramref name="on"/>.</summary>
    public static DeviceWorksheet For(DeviceHistory history, DateOnly on, TestStage stage, IReadOnlyDictionary<string, CurveTable> tables, FindingPolicy policy)
    {
        ArgumentNullException.ThrowIfNull(history);
        ArgumentNullException.ThrowIfNull(tables);
        ArgumentNullException.ThrowIfNull(policy);
        var device = history.InForceOn(on);
        var envelope = EnvelopeFactory.For(device, device.Settings, 1.0, tables);
        var table = device.Settings is CurveTableSettings own && tables.TryGetValue(own.Table, out var t) ? t : null;
        return new DeviceWorksheet(device, stage, envelope, TripTestPlan.For(device, envelope, table), Contacts(device, policy), Insulation(device, policy));
    }

    private static List<PlannedContact> Contacts(Device device, FindingPolicy policy)
    {
        var (amperes, setting) = policy.ContactTestCurrent(device.RatedCurrent.Value);
        var current = Amperes.Of(amperes);
        var basis = Invariant($"test current: lab policy {setting} (common practice from makers' maintenance guides) for a {device.RatedCurrent} breaker; ")
            + (device.ContactLimit is { } limit ? $"limit {limit} from the maker's data in the register" : "no limit in the register: the reading is trended against the device's own history and its poles");
        return Enumerable.Range(1, device.Poles)
            .Select(k => new PlannedContact(Pole.Parse(k.ToString(CultureInfo.InvariantCulture)), current, device.ContactLimit, basis))
            .ToList();
    }

    // Each pole to earth and across its open contacts, and each pair of neighbouring poles (common practice).
    private static List<PlannedInsulation> Insulation(Device device, FindingPolicy policy)
    {
        var row = InsulationMinimum.For(policy.InsulationTable, device.RatedVoltage);
        var basis = row?.Source ?? $"the policy's table has no row for a rated voltage of {device.RatedVoltage}: take the test voltage and minimum from the maker";
        var paths = new List<string>();
        for (var k = 1; k <= device.Poles; k++)
        {
            paths.Add($"{k}-E");
            paths.Add($"{k}-{k}'");
        }

        for (var k = 1; k < device.Poles; k++)
        {
            paths.Add($"{k}-{k + 1}");
        }

        return paths.Select(p => new PlannedInsulation(p, row?.TestVoltage, row?.Minimum, basis)).ToList();
    }

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
