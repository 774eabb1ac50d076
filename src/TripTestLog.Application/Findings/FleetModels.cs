using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Which models fail, gathered as devices stream past: for each make and model, and for each age band, how many devices
/// had an as-found trip test in the window, how many of them failed one (a trip outside its band), the failure rate with
/// its 95 % Wilson score interval (Wilson 1927), and the mean rise of contact resistance per year. Holds one counter row
/// per group, however large the fleet.
/// </summary>
public sealed class FleetModels(FindingPolicy policy, InstrumentRegister instruments, DateOnly asOf)
{
    private readonly SortedDictionary<(string Make, string Model), Counts> _models = [];
    private readonly SortedDictionary<int, Counts> _ages = [];

    /// <summary>The window's first day: as-found tests on or after it are counted.</summary>
    public DateOnly From { get; } = asOf.AddDays(-(int)Math.Round(policy.FleetWindowYears * 365.25));

    /// <summary>The window's last day, the day judged.</summary>
    public DateOnly To { get; } = asOf;

    /// <summary>The fewest devices a figure rests on.</summary>
    public int MinimumDevices { get; } = policy.FleetMinimumDevices;

    /// <summary>One group's counts.</summary>
    public sealed class Counts
    {
        /// <summary>Devices in the register in this group.</summary>
        public int Devices { get; internal set; }

        /// <summary>Devices with an as-found trip test in the window.</summary>
        public int Tested { get; internal set; }

        /// <summary>Of those, devices with an as-found trip test outside its band in the window.</summary>
        public int Failed { get; internal set; }

        /// <summary>Devices whose contact resistance rise per year is known (as-found readings on two dates or more).</summary>
        public int RiseDevices { get; internal set; }

        private double _riseSum;

        /// <summary>The failure rate with its 95 % Wilson interval; null below the policy's minimum of devices tested.</summary>
        public WilsonInterval? Rate(int minimum) => Tested >= minimum && Tested > 0 ? WilsonInterval.Of(Failed, Tested) : null;

        /// <summary>The mean contact resistance rise, µΩ a year at 20 °C; null below the policy's minimum of devices.</summary>
        public double? MeanRise(int minimum) => RiseDevices >= minimum && RiseDevices > 0 ? _riseSum / RiseDevices : null;

        internal void Add(bool tested, bool failed, double? rise)
        {
            Devices++;
            Tested += tested ? 1 : 0;
            Failed += failed ? 1 : 0;
            if (rise is { } r)
            {
                RiseDevices++;
                _riseSum += r;
            }
        }
    }

    /// <summary>Groups by make and model, in name order.</summary>
    public IReadOnlyDictionary<(string Make, string Model), Counts> Models => _models;

    /// <summary>Groups by age band: the key is the band's first year of age (0, 5, 10, ...), -1 for no commissioning date.</summary>
    public IReadOnlyDictionary<int, Counts> AgeBands => _ages;

    /// <summary>The width of an age band, in years.</summary>
    public const int BandYears = 5;

    /// <summary>An age band in words: "0-4 years", "20-24 years", or "unknown".</summary>
    public static string BandName(int band) => band < 0 ? "unknown" : $"{band}-{band + BandYears - 1} years";

    /// <summary>Counts one device.</summary>
    public void Add(DeviceReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var device = report.Condition.Device;
        var found = report.Trips.Where(t => t.Trip.Measurement.Stage == TestStage.AsFound
            && t.Trip.Measurement.TestedAt.Date >= From && t.Trip.Measurement.TestedAt.Date <= To).ToList();
        var tested = found.Count > 0;
        var failed = found.Any(t => t.Assessment.IsFailure);
        var rise = Rise(report);
        var key = (device.Make.Trim(), device.Model.Trim());
        if (!_models.TryGetValue(key, out var model))
        {
            _models[key] = model = new Counts();
        }

        model.Add(tested, failed, rise);
        var band = device.CommissionedOn is { } c ? Math.Max(0, (To.DayNumber - c.DayNumber) / 365 / BandYears * BandYears) : -1;
        if (!_ages.TryGetValue(band, out var age))
        {
            _ages[band] = age = new Counts();
        }

        age.Add(tested, failed, rise);
    }

    // The device's rise: for each pole, (latest - first as-found reading at 20 °C) over the years between, averaged over its
    // poles; readings from an untraceable instrument are left out where the lab policy leaves them out of trends.
    private double? Rise(DeviceReport report)
    {
        var poles = ReadingHistory.Contacts(report.Records.Contacts, policy, instruments)
            .Where(p => p.Stage == TestStage.AsFound && (p.Traceable || policy.UntraceableReadings == UntraceableReadings.Mark)).GroupBy(p => p.Pole)
            .Select(g => (First: g.First(), Last: g.Last()))
            .Where(x => x.Last.Date > x.First.Date)
            .Select(x => (x.Last.CorrectedMicroOhms - x.First.CorrectedMicroOhms) / ((x.Last.Date.DayNumber - x.First.Date.DayNumber) / 365.25))
            .ToList();
        return poles.Count == 0 ? null : poles.Average();
    }
}
