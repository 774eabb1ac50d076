using System.Globalization;

namespace TripTestLog.Domain.Quantities;

/// <summary>An electric current in amperes (RMS for AC injection, mean for DC). Always finite and above zero.</summary>
public readonly record struct Amperes : IComparable<Amperes>
{
    private Amperes(double value) => Value = value;

    /// <summary>The current in amperes.</summary>
    public double Value { get; }

    /// <summary>Creates a current; throws <see cref="ArgumentOutOfRangeException"/> for NaN, infinities, zero or negative values.</summary>
    public static Amperes Of(double amperes) => new(Guard.Positive(amperes, nameof(amperes), "A"));

    /// <summary>The ratio of two currents, e.g. a test current over the rated current.</summary>
    public static CurrentMultiple operator /(Amperes current, Amperes reference) => CurrentMultiple.Of(current.Value / reference.Value);

    /// <inheritdoc />
    public int CompareTo(Amperes other) => Value.CompareTo(other.Value);

    /// <summary>Compares two currents.</summary>
    public static bool operator <(Amperes left, Amperes right) => left.Value < right.Value;

    /// <summary>Compares two currents.</summary>
    public static bool operator >(Amperes left, Amperes right) => left.Value > right.Value;

    /// <summary>Compares two currents.</summary>
    public static bool operator <=(Amperes left, Amperes right) => left.Value <= right.Value;

    /// <summary>Compares two currents.</summary>
    public static bool operator >=(Amperes left, Amperes right) => left.Value >= right.Value;

    /// <inheritdoc />
    public override string ToString() => Value.ToString("0.###", CultureInfo.InvariantCulture) + " A";
}
