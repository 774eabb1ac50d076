using System.Globalization;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Settings;

/// <summary>
/// A time tolerance of ±<see cref="Fraction"/> of the nominal time, but never less than ±<see cref="Floor"/>: the form
/// in which IEC 60255-151 has makers declare operate-time accuracy (a percentage with a minimum absolute error).
/// </summary>
public readonly record struct TimeTolerance
{
    private TimeTolerance(double fraction, Seconds floor)
    {
        Fraction = fraction;
        Floor = floor;
    }

    /// <summary>The relative part, e.g. 0.05 for ±5 %.</summary>
    public double Fraction { get; }

    /// <summary>The smallest absolute tolerance.</summary>
    public Seconds Floor { get; }

    /// <summary>Creates a tolerance; the fraction must lie in [0, 0.9] and the floor in [0, 10] s.</summary>
    public static TimeTolerance Of(double fraction, Seconds floor)
    {
        Guard.InRange(fraction, 0, 0.9, nameof(fraction), "(fraction)");
        Guard.InRange(floor.Value, 0, 10, nameof(floor), "s");
        return new TimeTolerance(fraction, floor);
    }

    /// <summary>The earliest time the tolerance allows around <paramref name="nominal"/> (never below zero).</summary>
    public Seconds Earliest(double nominal) => Seconds.Of(Math.Max(0, nominal - Spread(nominal)));

    /// <summary>The latest time the tolerance allows around <paramref name="nominal"/>.</summary>
    public Seconds Latest(double nominal) => Seconds.Of(nominal + Spread(nominal));

    /// <inheritdoc />
    public override string ToString() =>
        $"±{(Fraction * 100).ToString("0.#", CultureInfo.InvariantCulture)} % (at least ±{Floor})";

    private double Spread(double nominal) => Math.Max(nominal * Fraction, Floor.Value);
}
