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

        if (entries.Any(e => e.Tag != entries[0].Tag))
        {
            throw new ArgumentException("a device history holds the entries of one device only", nameof(entries));
        }

        // Stable order: by the date the settings took effect (none = from the start), then as imported.
        _entries = entries.Select((e, i) => (e, i)).OrderBy(x => x.e.SettingsFrom ?? DateOnly.MinValue).ThenBy(x => x.i).Select(x => x.e).ToList();
    }

    /// <summary>The entries, oldest settings first.</summary>
    public IReadOnlyList<Device> Entries => _entries;

    /// <summary>The newest entry.</summary>
    public Device Latest => _entries[^1];

    /// <summary>The entry in force on <paramref name="date"/>: the last whose settings took effect on or before it, else the first.</summary>
    public Device InForceOn(DateOnly date) =>
        _entries.LastOrDefault(e => (e.SettingsFrom ?? DateOnly.MinValue) <= date) ?? _entries[0];
}
