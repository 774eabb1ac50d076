using System.Data.Common;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Devices;

namespace TripTestLog.Storage;

/// <summary>
/// How a register file meets the stored register, for every store: new devices added, every new entry kept as a
/// revision, the `devices` row holding the entry with the newest settings. A register may list several entries for one
/// device with different settings_from dates (its settings history). Counts are per row: a row adds an entry of a
/// device new to the database (added), adds an entry to a device stored before (updated), repeats an earlier row of
/// the file, or matches a stored entry.
/// </summary>
internal static class RegisterMerge
{
    /// <summary>The stored entries by tag (compared as <see cref="AssetTag.Comparer"/> does): rows of device id, tag, then the register columns, oldest first.</summary>
    public static Dictionary<string, (long Id, List<Device> Revisions)> Stored(DbDataReader r)
    {
        var entries = new Dictionary<string, (long Id, List<Device> Revisions)>(AssetTag.Comparer);
        while (r.Read())
        {
            var device = DeviceMapping.Read(r, first: 1);
            if (!entries.TryGetValue(device.Tag.Value, out var entry))
            {
                entry = (r.GetInt64(0), []);
                entries[device.Tag.Value] = entry;
            }

            entry.Revisions.Add(device);
        }

        return entries;
    }

    /// <param name="rows">The file's register rows.</param>
    /// <param name="stored">The stored entries (see <see cref="Stored"/>); updated as rows are kept.</param>
    /// <param name="addDevice">Writes a device new to the store from its first entry and line; returns its id.</param>
    /// <param name="addRevision">Keeps an entry, with the device's id and the line.</param>
    /// <param name="setLatest">Makes an entry of this file, at its line, the one the `devices` row holds.</param>
    public static (long Added, long Updated, long Duplicates) Run(
        IEnumerable<Located<Device>> rows,
        Dictionary<string, (long Id, List<Device> Revisions)> stored,
        Func<Device, long, long> addDevice,
        Action<Device, long, long> addRevision,
        Action<Device, long> setLatest)
    {
        long added = 0, updated = 0, duplicates = 0;
        var seen = new HashSet<Device>();
        var lines = new Dictionary<Device, long>();
        var touched = new HashSet<string>(AssetTag.Comparer);
        var newHere = new HashSet<string>(AssetTag.Comparer);
        foreach (var (device, line) in rows)
        {
            var tag = device.Tag.Value;
            if (!seen.Add(device))
            {
                duplicates++;
                continue;
            }

            lines[device] = line;
            if (!stored.TryGetValue(tag, out var entries))
            {
                entries = (addDevice(device, line), []);
                stored[tag] = entries;
                newHere.Add(tag);
                added++;
            }
            else if (entries.Revisions.Contains(device))
            {
                continue;
            }
            else if (newHere.Contains(tag))
            {
                // A later entry of a device this file brings in (its settings history) is new too, not an update.
                added++;
            }
            else
            {
                updated++;
            }

            addRevision(device, entries.Id, line);
            entries.Revisions.Add(device);
            touched.Add(tag);
        }

        foreach (var tag in touched)
        {
            var latest = new DeviceHistory(stored[tag].Revisions).Latest;
            if (lines.TryGetValue(latest, out var line))
            {
                setLatest(latest, line);
            }
        }

        return (added, updated, duplicates);
    }
}
