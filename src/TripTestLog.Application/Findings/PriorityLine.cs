using TripTestLog.Domain.Codes;

namespace TripTestLog.Application.Findings;

/// <summary>
/// One line of the priority list: a device, or several devices whose worst open finding has one cause, so a lapsed
/// ohmmeter makes one line naming the devices rather than one line each.
/// </summary>
/// <param name="Devices">The devices, in priority order; the first sets the line's place.</param>
/// <param name="Cause">What they share, e.g. "instrument OHM-2"; null for a line of one device on its own.</param>
public sealed record PriorityLine(IReadOnlyList<DeviceCondition> Devices, string? Cause)
{
    /// <summary>The cause a device's worst open finding shares with others' (an instrument), or null.</summary>
    public static string? CauseOf(DeviceCondition device)
    {
        ArgumentNullException.ThrowIfNull(device);
        return device.WorstOpen is { Instrument: { } instrument } worst
            ? $"{TextCodes.FindingKind.Of(worst.Kind)}|{device.Grade}|{instrument}"
            : null;
    }

    /// <summary>Groups <paramref name="priority"/> (already in order) into lines, keeping the order of each group's first device.</summary>
    public static IReadOnlyList<PriorityLine> Group(IReadOnlyList<DeviceCondition> priority)
    {
        ArgumentNullException.ThrowIfNull(priority);
        var lines = new List<(List<DeviceCondition> Devices, string? Cause)>();
        var byCause = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var device in priority)
        {
            if (CauseOf(device) is { } cause)
            {
                if (byCause.TryGetValue(cause, out var at))
                {
                    lines[at].Devices.Add(device);
                    continue;
                }

                byCause[cause] = lines.Count;
            }

            lines.Add(([device], CauseOf(device)));
        }

        return [.. lines.Select(l => new PriorityLine(l.Devices, l.Devices.Count > 1 ? "instrument " + l.Cause![(l.Cause!.LastIndexOf('|') + 1)..] : null))];
    }
}
