using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Measurements;

/// <summary>What a trip test saw: the breaker tripped after some time, or held the current for some time without tripping.</summary>
public readonly record struct TripOutcome
{
    private TripOutcome(bool tripped, Seconds time)
    {
        Tripped = tripped;
        Time = time;
    }

    /// <summary>True when the breaker tripped; false when it held.</summary>
    public bool Tripped { get; }

    /// <summary>The trip time when it tripped, the hold time when it did not.</summary>
    public Seconds Time { get; }

    /// <summary>The breaker tripped after <paramref name="tripTime"/>.</summary>
    public static TripOutcome TrippedAfter(Seconds tripTime) => new(true, tripTime);

    /// <summary>The breaker carried the current for <paramref name="heldFor"/> without tripping, and the test was stopped.</summary>
    public static TripOutcome HeldFor(Seconds heldFor) => new(false, heldFor);

    /// <inheritdoc />
    public override string ToString() => Tripped ? $"tripped after {Time}" : $"held {Time}";
}
