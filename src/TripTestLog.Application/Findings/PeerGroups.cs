using System.Globalization;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Each peer group's results at one test point: devices of the same family, curve or settings, and rating, compared by
/// the latest as-found trip time's position within its band (0 at the earliest allowed time, 1 at the latest, on a
/// log axis), so devices tested at slightly different currents compare fairly. Holds one number per device and point.
/// </summary>
internal sealed class PeerGroups
{
    private readonly Dictionary<string, List<double>> _positions = new(StringComparer.Ordinal);
    private Dictionary<string, Group>? _groups;

    /// <summary>A group's median and median absolute deviation of positions, and its size.</summary>
    public sealed record Group(double Median, double Mad, int Count);

    /// <summary>The group a device's result at <paramref name="point"/> belongs to.</summary>
    public static (string Key, string Name) GroupOf(Device device, TripPoint point)
    {
        var rating = device.RatedCurrent.Value.ToString("0.##", CultureInfo.InvariantCulture);
        var name = $"{TextCodes.Family.Of(device.Family)}, {device.Settings.Summary}, {rating} A";
        return ($"{name}|{point.Key}", name);
    }

    /// <summary>Adds one device's position to a group (first pass).</summary>
    public void Add(string key, double position)
    {
        if (_groups is not null)
        {
            throw new InvalidOperationException("peer groups are sealed");
        }

        if (!_positions.TryGetValue(key, out var list))
        {
            _positions[key] = list = [];
        }

        list.Add(position);
    }

    /// <summary>Computes each group's statistics and lets go of the positions.</summary>
    public void Seal()
    {
        _groups = _positions.ToDictionary(p => p.Key, p => new Group(RobustStatistics.Median(p.Value), RobustStatistics.MedianAbsoluteDeviation(p.Value), p.Value.Count),
            StringComparer.Ordinal);
        _positions.Clear();
    }

    /// <summary>Every group's key, once sealed.</summary>
    public IEnumerable<string> Keys => (_groups ?? throw new InvalidOperationException("peer groups are not sealed yet")).Keys;

    /// <summary>The statistics of a group; null when no device is in it.</summary>
    public Group? Of(string key) =>
        (_groups ?? throw new InvalidOperationException("peer groups are not sealed yet")).GetValueOrDefault(key);
}
