using System.Globalization;

namespace TripTestLog.Domain.Quantities;

/// <summary>A finite duration in seconds, zero or more: a measured trip time, a hold time or a band edge.</summary>
public readonly record struct Seconds : IComparable<Seconds>
{
    private Seconds(double value) => Value = value;

    /// <summary>Zero seconds.</summary>
    public static Seconds Zero => default;

    /// <summary>The duration in seconds.</summary>
    public double Value { get; }

    /// <summary>Creates a duration; throws <see cref="ArgumentOutOfRangeException"/> for NaN, infinities or negative values.</summary>
    public static Seconds Of(double seconds) => new(Guard.NonNegative(seconds, nameof(seconds), "s"));

    /// <summary>A duration given in hours.</summary>
    public static Seconds FromHours(double hours) => Of(hours * 3600.0);

    /// <inheritdoc />
    public int CompareTo(Seconds other) => Value.CompareTo(other.Value);

    /// <summary>Compares two durations.</summary>
    public static bool operator <(Seconds left, Seconds right) => left.Value < right.Value;

    /// <summary>Compares two durations.</summary>
    public static bool operator >(Seconds left, Seconds right) => left.Value > right.Value;

    /// <summary>Compares two durations.</summary>
    public static bool operator <=(Seconds left, Seconds right) => left.Value <= right.Value;

    /// <summary>Compares two durations.</summary>
    public static bool operator >=(Seconds left, Seconds right) => left.Value >= right.Value;

    /// <summary>Readable form: milliseconds below one second, seconds above.</summary>
    public override string ToString() => Value switch
    {
        < 1.0 => (Value * 1000.0).ToString("0.#", CultureInfo.InvariantCulture) + " ms",
        < 100.0 => Value.ToString("0.##", CultureInfo.InvariantCulture) + " s",
        _ => Value.ToString("0", CultureInfo.InvariantCulture) + " s",
    };
}
