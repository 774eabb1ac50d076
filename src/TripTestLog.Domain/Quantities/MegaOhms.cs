namespace TripTestLog.Domain.Quantities;

/// <summary>An insulation resistance in megohms. Finite and above zero.</summary>
public readonly record struct MegaOhms : IComparable<MegaOhms>
{
    private MegaOhms(double value) => Value = value;

    /// <summary>The resistance in megohms.</summary>
    public double Value { get; }

    /// <summary>Creates a resistance; throws <see cref="ArgumentOutOfRangeException"/> for NaN, infinities, zero or negative values.</summary>
    public static MegaOhms Of(double megaOhms) => new(Guard.Positive(megaOhms, nameof(megaOhms), ResistanceText.MegaOhmUnit));

    /// <inheritdoc />
    public int CompareTo(MegaOhms other) => Value.CompareTo(other.Value);

    /// <inheritdoc />
    public override string ToString() => ResistanceText.MegaOhms(Value);
}
