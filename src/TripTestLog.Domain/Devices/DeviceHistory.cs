namespace TripTestLog.Domain.Devices;

/// <summary>Every register entry a device has had, so each test is judged with the entry in force on its date.</summary>
public sealed class DeviceHistory
{
    private readonly IReadOnlyList<Device> _entries;

    /// <summary>Creates the history; <paramref name="entries"/> must hold at least one entry, all for one device.</summary>
    public DeviceHistory(IReadOnlyList<Device> entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        if (entries.Count == 0)
        {
            throw new ArgumentException("a device history needs at least one register entry", nameof(entries));
        }

        var ordered = new Device[entries.Count];
        for (var i = 0; i < ordered.Length; i++)
        {
            var entry = entries[i];
            if (entry.Tag != entries[0].Tag)
            {
                throw new ArgumentException("a device history holds the entries of one device only", nameof(entries));
            }

            // Stable order: by the date the settings took effect (none = from the start), then as imported. An insertion
            // sort, not LINQ: most devices hold one or two entries, and every command reads every device's history.
            var at = i;
            while (at > 0 && From(ordered[at - 1]) > From(entry))
            {
                ordered[at] = ordered[at - 1];
                at--;
            }

            ordered[at] = entry;
        }

        _entries = ordered;
    }

    /// <summary>The entries, oldest settings first.</summary>
    public IReadOnlyList<Device> Entries => _entries;

    /// <summary>The newest entry.</summary>
    public Device Latest => _entries[^1];

    /// <summary>The entry in force on <paramref name="date"/>: the last whose settings took effect on or before it, else the first.</summary>
    public Device InForceOn(DateOnly date)
    {
        for (var i = _entries.Count - 1; i > 0; i--)
        {
            if (From(_entries[i]) <= date)
            {
                return _entries[i];
            }
        }

        return _entries[0];
    }

    private static DateOnly From(Device entry) => entry.SettingsFrom ?? DateOnly.MinValue;
}
