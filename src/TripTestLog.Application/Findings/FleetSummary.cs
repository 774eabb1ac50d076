using TripTestLog.Domain.Condition;

namespace TripTestLog.Application.Findings;

/// <summary>
/// The fleet at a glance, gathered as device conditions stream past: counts by site and grade, and the top of the
/// priority list. Holds one counter row per site and the top <c>size</c> devices only, however large the fleet.
/// </summary>
public sealed class FleetSummary(int size)
{
    private readonly SortedDictionary<string, SiteCounts> _sites = new(StringComparer.Ordinal);
    private readonly SortedSet<DeviceCondition> _top = new(PriorityOrder.Instance);

    /// <summary>One site's counts.</summary>
    public sealed class SiteCounts
    {
        /// <summary>Devices by grade.</summary>
        public int[] ByGrade { get; } = new int[Enum.GetValues<ConditionGrade>().Length];

        /// <summary>Devices overdue for test.</summary>
        public int Overdue { get; set; }

        /// <summary>All devices.</summary>
        public int Devices => ByGrade.Sum();
    }

    /// <summary>Counts by site, in site order.</summary>
    public IReadOnlyDictionary<string, SiteCounts> Sites => _sites;

    /// <summary>The devices that need attention, most urgent first, at most the size asked for.</summary>
    public IReadOnlyList<DeviceCondition> Priority => [.. _top];

    /// <summary>
    /// The priority list as lines to read: devices whose worst finding has one cause (one instrument used while
    /// untraceable) share one line, at the place of the first of them.
    /// </summary>
    public IReadOnlyList<PriorityLine> Lines => PriorityLine.Group(Priority);

    /// <summary>Counts one device and keeps it if it ranks among the top.</summary>
    public void Add(DeviceCondition device)
    {
        ArgumentNullException.ThrowIfNull(device);
        if (!_sites.TryGetValue(device.Device.Site, out var counts))
        {
            _sites[device.Device.Site] = counts = new SiteCounts();
        }

        counts.ByGrade[(int)device.Grade]++;
        counts.Overdue += device.Overdue ? 1 : 0;
        if (!device.NeedsAttention)
        {
            return;
        }

        _top.Add(device);
        if (_top.Count > size)
        {
            _top.Remove(_top.Max!);
        }
    }
}

/// <summary>
/// The asset manager's order: worst grade first; within a grade, the most critical (the register's criticality, 1
/// first); then the furthest past its limit (a margin as a fraction of the limit, none last); then the soonest date (a
/// forecast or the due date); then asset tag so the order is total.
/// </summary>
public sealed class PriorityOrder : IComparer<DeviceCondition>
{
    /// <summary>The one instance.</summary>
    public static PriorityOrder Instance { get; } = new();

    /// <inheritdoc />
    public int Compare(DeviceCondition? x, DeviceCondition? y)
    {
        if (ReferenceEquals(x, y))
        {
            return 0;
        }

        if (x is null || y is null)
        {
            return x is null ? 1 : -1;
        }

        var c = y.Grade.CompareTo(x.Grade);
        if (c != 0)
        {
            return c;
        }

        c = x.Device.Criticality.CompareTo(y.Device.Criticality);
        if (c != 0)
        {
            return c;
        }

        c = (y.Margin ?? -1).CompareTo(x.Margin ?? -1);
        if (c != 0)
        {
            return c;
        }

        c = x.SoonestDate.CompareTo(y.SoonestDate);
        return c != 0 ? c : string.CompareOrdinal(x.Device.Tag.Value, y.Device.Tag.Value);
    }
}
