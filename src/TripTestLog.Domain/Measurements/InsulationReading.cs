using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Measurements;

/// <summary>An insulation resistance reading; when <see cref="OverRange"/> is true the true value is above <see cref="Value"/>.</summary>
/// <param name="Value">The reading, or the instrument's range limit when over range.</param>
/// <param name="OverRange">True when the instrument showed "more than" its range (written with a leading '&gt;').</param>
public readonly record struct InsulationReading(MegaOhms Value, bool OverRange)
{
    /// <inheritdoc />
    public override string ToString() => (OverRange ? ">" : "") + Value;
}
