using System.Globalization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Planning;

/// <summary>
/// The trip tests to make on one device, in the order to make them, each with the window the check will apply:
/// <list type="bullet">
/// <item>IEC 60898-1 (and IEC 61009-1, IEC 60898-2): Table 7 rows a to e, and the single-pole point of a multipole breaker.</item>
/// <item>IEC 60947-2: 1.05 Ir and 1.30 Ir, a long-time point, 0.8 and 1.2 x Isd, 0.8 and 1.2 x Ii (Im on a thermal-magnetic release).</item>
/// <item>Relays: 2, 5 and 10 x the pickup below the high-set, then 1.2 x the high-set.</item>
/// <item>A maker's curve table: its own rows.</item>
/// </list>
/// Where the standard defines a point, the plan takes it as the standard states it. The other points are the lab's
/// usual choice (common practice, no standard names them); their windows still come from the envelope, so a point with
/// no requirement says so instead of inventing one.
/// </summary>
public static class TripTestPlan
{
    /// <summary>The multiples of the pickup at which an inverse-time relay is timed (common practice: 2, 5 and 10).</summary>
    public static readonly IReadOnlyList<double> RelayMultiples = [2, 5, 10];

    /// <summary>The plan for <paramref name="device"/> judged by <paramref name="envelope"/>; <paramref name="table"/> is its curve table, when it names one.</summary>
    public static IReadOnlyList<PlannedTrip> For(Device device, ITripEnvelope envelope, CurveTable? table = null)
    {
        ArgumentNullException.ThrowIfNull(device);
        ArgumentNullException.ThrowIfNull(envelope);
        if (envelope is UnavailableEnvelope)
        {
            return [];
        }

        var plan = new List<PlannedTrip>();
        foreach (var point in envelope.Points)
        {
            plan.Add(Normative(envelope, point, plan.Count > 0 ? plan[^1] : null));
        }

        switch (device.Settings)
        {
            case ElectronicTripSettings s:
                var releases = new[] { s.Isd, s.Ii }.OfType<Amperes>().ToList();
                plan.Add(LongTime(envelope, s.TrReferenceMultiple, releases, $"long-time delay tr {s.Tr} stated at {Number(s.TrReferenceMultiple)} Ir (setting)"));
                AddPickup(plan, envelope, s.Isd, "Isd", "short-time");
                AddPickup(plan, envelope, s.Ii, "Ii", "instantaneous");
                break;
            case ThermalMagneticSettings s:
                plan.Add(LongTime(envelope, 3, [s.Im], "thermal release between the conventional points and the magnetic setting"));
                AddPickup(plan, envelope, s.Im, "Im", "magnetic");
                break;
            case RelaySettings s:
                foreach (var m in RelayMultiples)
                {
                    var current = Amperes.Of(m * s.Pickup.Value);
                    if (s.HighSet is { } hs && current.Value >= 0.8 * hs.Value)
                    {
                        continue;
                    }

                    plan.Add(Point(envelope, $"{Number(m)} x pickup", current, TestConditions.Reference, null,
                        $"{Number(m)} x pickup on the IDMT curve (common practice for timing a relay)"));
                }

                if (s.HighSet is { } high)
                {
                    plan.Add(Point(envelope, "1.2 x high-set", Amperes.Of(1.2 * high.Value), TestConditions.Reference, null,
                        $"definite-time high-set {high} after {s.HighSetDelay}: 1.2 x setting, where it must operate (common practice)"));
                }

                break;
            case CurveTableSettings when table is not null:
                foreach (var row in table.Points)
                {
                    plan.Add(Point(envelope, $"{Number(row.Multiple.Value)} In", row.Multiple * envelope.Reference, TestConditions.Reference, null,
                        $"curve table {table.Name}, row {Number(row.Multiple.Value)} In"));
                }

                break;
        }

        return plan;
    }

    private static PlannedTrip Normative(ITripEnvelope envelope, NormativePoint point, PlannedTrip? previous)
    {
        var conditions = new TestConditions(point.Start, point.Loading ?? PoleLoading.AllPoles);
        var current = point.Multiple * envelope.Reference;
        return Point(envelope, point.Label, current, conditions, point.IsNoTripPoint ? point.MustHoldFor : null, point.Requirement) with
        {
            // A warm point follows the point before it with no cooling between (IEC 60898-1 row b after row a).
            StraightAfterPrevious = point.Start == StartCondition.Warm && previous is not null,
        };
    }

    // A point on the long-time (thermal) release: at the multiple where the delay is stated, unless that reaches a faster
    // release's tolerance band; then midway (geometrically) between 1.30 Ir and 80 % of the lowest such setting, rounded down to a half multiple.
    private static PlannedTrip LongTime(ITripEnvelope envelope, double multiple, IReadOnlyList<Amperes> faster, string why)
    {
        var reference = envelope.Reference.Value;
        var current = multiple * reference;
        if (faster.Count > 0 && faster.Min(a => a.Value) * 0.8 is var ceiling && current >= ceiling)
        {
            // Rounded down to a half multiple of Ir, where a dial or a test set is set most easily.
            var middle = Math.Sqrt(1.30 * ceiling / reference);
            multiple = Math.Floor(middle * 2) / 2 > 1.30 ? Math.Floor(middle * 2) / 2 : middle;
            current = multiple * reference;
        }

        return Point(envelope, $"{Number(multiple)} Ir", Amperes.Of(current), TestConditions.Reference, null, why + " (common practice)");
    }

    private static void AddPickup(List<PlannedTrip> plan, ITripEnvelope envelope, Amperes? setting, string name, string release)
    {
        if (setting is not { } s)
        {
            return;
        }

        // A family that states the 80 % point as one of its own (the magnetic release's) has planned it already.
        var low = Amperes.Of(0.8 * s.Value);
        if (!plan.Any(p => Math.Abs(p.Current.Value - low.Value) <= 1e-9 * low.Value))
        {
            plan.Add(Point(envelope, $"0.8 {name}", low, TestConditions.Reference, null,
                $"IEC 60947-2 8.3.3 (from memory): the {release} release does not operate at 80 % of {name} {s}"));
        }

        plan.Add(Point(envelope, $"1.2 {name}", Amperes.Of(1.2 * s.Value), TestConditions.Reference, null,
            $"IEC 60947-2 8.3.3 (from memory): the {release} release operates at 120 % of {name} {s}"));
    }

    private static PlannedTrip Point(ITripEnvelope envelope, string label, Amperes current, TestConditions conditions, Seconds? hold, string basis) =>
        new(label, current, current / envelope.Reference, conditions, hold, envelope.At(current).For(conditions), basis);

    private static string Number(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);
}
