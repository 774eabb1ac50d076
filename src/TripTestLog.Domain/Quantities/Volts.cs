using System.Globalization;

namespace TripTestLog.Domain.Quantities;

/// <summary>A voltage in volts: a rated voltage or an insulation test voltage. Finite and above zero.</summary>
public readonly record struct Volts
{
    private Volts(double value) => Value = value;

    /// <summary>The voltage in volts.</summary>
    public double Value { get; }

    /// <summary>Creates a voltage; throws <see cref="ArgumentOutOfRangeException"/> for NaN, infinities, zero or negative values.</summary>
    public static Volts Of(double volts) => new(Guard.Positive(volts, nameof(volts), "V"));

    /// <inheritdoc />
    public override string ToString() => Value.ToString("0.#", CultureInfo.InvariantCulture) + " V";
}
