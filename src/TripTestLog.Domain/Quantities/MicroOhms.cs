namespace TripTestLog.Domain.Quantities;

/// <summary>A contact resistance in micro-ohms. Finite and above zero.</summary>
public readonly record struct MicroOhms : IComparable<MicroOhms>
{
    private MicroOhms(double value) => Value = value;

    /// <summary>The resistance in micro-ohms.</summary>
    public double Value { get; }

    /// <summary>Creates a resistance; throws <see cref="ArgumentOutOfRangeException"/> for NaN, infinities, zero or negative values.</summary>
    public static MicroOhms Of(double microOhms) => new(Guard.Positive(microOhms, nameof(microOhms), ResistanceText.MicroOhmUnit));

    /// <inheritdoc />
    public int CompareTo(MicroOhms other) => Value.CompareTo(other.Value);

    /// <inheritdoc />
    public override string ToString() => ResistanceText.MicroOhms(Value);
}
