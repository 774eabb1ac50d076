using System.Globalization;

namespace TripTestLog.Domain.Quantities;

/// <summary>A temperature in degrees Celsius, limited to what a test site can plausibly see (-60 to +150).</summary>
public readonly record struct Celsius
{
    private Celsius(double value) => Value = value;

    /// <summary>The temperature in degrees Celsius.</summary>
    public double Value { get; }

    /// <summary>Creates a temperature; throws <see cref="ArgumentOutOfRangeException"/> outside -60 to +150 or for NaN and infinities.</summary>
    public static Celsius Of(double celsius) => new(Guard.InRange(celsius, -60, 150, nameof(celsius), "C"));

    /// <inheritdoc />
    public override string ToString() => Value.ToString("0.#", CultureInfo.InvariantCulture) + " °C";
}
