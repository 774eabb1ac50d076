namespace TripTestLog.Application.Stores;

/// <summary>How a store is opened: for what, how long it waits for another process's write, and where it says so.</summary>
/// <param name="Purpose">What the command will do with the store.</param>
/// <param name="Patience">How long a write waits for another process's write (the lab policy's store_wait_minutes).</param>
/// <param name="Waiting">Told, once per wait, what is being waited for (a command prints it on stderr); may be null.</param>
public sealed record StoreOpening(StorePurpose Purpose, TimeSpan Patience, Action<string>? Waiting = null)
{
    /// <summary>The wait the docs promise when the lab policy says nothing else: 10 minutes.</summary>
    public static readonly TimeSpan DefaultPatience = TimeSpan.FromMinutes(10);

    /// <summary>Opening to import, with the default wait and nobody told.</summary>
    public static StoreOpening ForImport { get; } = new(StorePurpose.Import, DefaultPatience);

    /// <summary>Opening to read, with the default wait and nobody told.</summary>
    public static StoreOpening ForReading { get; } = new(StorePurpose.Read, DefaultPatience);

    /// <summary>Says what is being waited for, if anyone listens.</summary>
    public void Note(string what) => Waiting?.Invoke(what);

    /// <summary>The bound in words, as messages give it ("10 minutes").</summary>
    public string PatienceText => Patience.TotalMinutes >= 1 && Patience.TotalMinutes % 1 == 0
        ? $"{Patience.TotalMinutes:0} minute{(Patience.TotalMinutes == 1 ? "" : "s")}"
        : $"{Patience.TotalSeconds:0.#} seconds";
}
