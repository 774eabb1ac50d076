using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>
/// What the fleet page shows, gathered as devices stream past: the summary and priority list, the overdue devices,
/// the biggest drifts and soonest forecasts, results per family and rating, and the lapsed instruments with the tests
/// they touched. Every list is bounded, so memory does not grow with the fleet.
/// </summary>
public sealed class FleetReport(int top)
{
    private const int Listed = 25;
    private readonly List<(DeviceCondition Device, Finding Finding)> _drifts = [];
    private readonly List<(DeviceCondition Device, Finding Finding)> _forecasts = [];
    private readonly List<DeviceCondition> _overdue = [];
    private readonly SortedDictionary<(DeviceFamily Family, double Rating), int[]> _results = [];
    private readonly SortedDictionary<string, Lapse> _lapses = new(StringComparer.Ordinal);

    /// <summary>An instrument that was out of calibration or unregistered when used.</summary>
    public sealed class Lapse
    {
        /// <summary>Its latest finding, which says why (in words made at the edge).</summary>
        public Finding? Latest { get; set; }

        /// <summary>Records made with it while untraceable.</summary>
        public int Records { get; set; }

        /// <summary>Devices those records belong to.</summary>
        public int Devices { get; set; }
    }

    /// <summary>Which models fail; null when not asked for.</summary>
    public FleetModels? Models { get; init; }

    /// <summary>Counts by site and grade, and the priority list.</summary>
    public FleetSummary Summary { get; } = new(top);

    /// <summary>Overdue devices, longest overdue first (at most 25).</summary>
    public IReadOnlyList<DeviceCondition> Overdue => _overdue;

    /// <summary>The biggest trip drifts (at most 25), largest move first.</summary>
    public IReadOnlyList<(DeviceCondition Device, Finding Finding)> Drifts => _drifts;

    /// <summary>The soonest forecast exits and limits (at most 25).</summary>
    public IReadOnlyList<(DeviceCondition Device, Finding Finding)> Forecasts => _forecasts;

    /// <summary>Trip verdicts per family and rating, indexed by <see cref="Verdict"/>.</summary>
    public IReadOnlyDictionary<(DeviceFamily Family, double Rating), int[]> Results => _results;

    /// <summary>Instruments used while untraceable, by name.</summary>
    public IReadOnlyDictionary<string, Lapse> Lapses => _lapses;

    /// <summary>Takes one device into every list.</summary>
    public void Add(DeviceReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var device = report.Condition;
        Summary.Add(device);
        Models?.Add(report);
        foreach (var trip in report.Trips)
        {
            var key = (trip.Device.Family, trip.Device.RatedCurrent.Value);
            if (!_results.TryGetValue(key, out var counts))
            {
                _results[key] = counts = new int[Enum.GetValues<Verdict>().Length];
            }

            counts[(int)trip.Assessment.Verdict]++;
        }

        foreach (var finding in device.Findings)
        {
            switch (finding.Kind)
            {
                case FindingKind.TripDrift when finding.Open:
                    Keep(_drifts, (Device: device, Finding: finding), (a, b) => Math.Abs(b.Finding.Value?.Amount ?? 0).CompareTo(Math.Abs(a.Finding.Value?.Amount ?? 0)));
                    break;
                case FindingKind.CalibrationLapsed or FindingKind.InstrumentUnregistered when finding.Instrument is { } name:
                    if (!_lapses.TryGetValue(name, out var lapse))
                    {
                        _lapses[name] = lapse = new Lapse();
                    }

                    lapse.Latest = finding;
                    lapse.Records += finding.RestsOn.Count;
                    lapse.Devices++;
                    break;
            }

            if (finding.Open && finding.ForecastOn is not null)
            {
                Keep(_forecasts, (Device: device, Finding: finding), (a, b) => a.Finding.ForecastOn!.Value.CompareTo(b.Finding.ForecastOn!.Value));
            }
        }

        if (device.Overdue)
        {
            Keep(_overdue, device, (a, b) => a.DueOn.CompareTo(b.DueOn));
        }
    }

    private static void Keep<T>(List<T> list, T item, Comparison<T> order)
    {
        list.Add(item);
        list.Sort(order);
        if (list.Count > Listed)
        {
            list.RemoveAt(list.Count - 1);
        }
    }
}
