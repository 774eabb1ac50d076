using System.Globalization;

namespace TripTestLog.Domain.Quantities;

/// <summary>A current as a multiple of a reference current (In, Ir or a relay pickup). Finite and above zero.</summary>
public readonly record struct CurrentMultiple : IComparable<CurrentMultiple>
{
    private CurrentMultiple(double value) => Value = value;

    /// <summary>The dimensionless multiple.</summary>
    public double Value { get; }

    /// <summary>Creates a multiple; throws <see cref="ArgumentOutOfRangeException"/> for NaN, infinities, zero or negative values.</summary>
    public static CurrentMultiple Of(double multiple) => new(Guard.Positive(multiple, nameof(multiple), "x reference"));

    /// <summary>The current this multiple stands for, given the reference current.</summary>
    public static Amperes operator *(CurrentMultiple multiple, Amperes reference) => Amperes.Of(multiple.Value * reference.Value);

    /// <inheritdoc />
    public int CompareTo(CurrentMultiple other) => Value.CompareTo(other.Value);

    /// <summary>Compares two multiples.</summary>
    public static bool operator <(CurrentMultiple left, CurrentMultiple right) => left.Value < right.Value;

    /// <summary>Compares two multiples.</summary>
    public static bool operator >(CurrentMultiple left, CurrentMultiple right) => left.Value > right.Value;

    /// <summary>Compares two multiples.</summary>
    public static bool operator <=(CurrentMultiple left, CurrentMultiple right) => left.Value <= right.Value;

    /// <summary>Compares two multiples.</summary>
    public static bool operator >=(CurrentMultiple left, CurrentMultiple right) => left.Value >= right.Value;

    /// <inheritdoc />
    public override string ToString() => Value.ToString("0.###", CultureInfo.InvariantCulture) + " x";
}
