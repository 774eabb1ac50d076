using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// A curve table laid over a family's envelope: where the table covers the current its band is used, elsewhere the
/// family's. The family's normative points still decide a normative basis.
/// </summary>
public sealed class OverlayEnvelope(CurveTableEnvelope table, ITripEnvelope family) : ITripEnvelope
{
    /// <inheritdoc />
    public string Standard => $"{family.Standard} with {table.Standard}";

    /// <inheritdoc />
    public string ReferenceName => family.ReferenceName;

    /// <inheritdoc />
    public Amperes Reference => family.Reference;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => family.Points;

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => family.IsThermal(current);

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        if (!table.Covers(current))
        {
            return family.At(current);
        }

        var band = table.At(current);
        return band with { Multiple = current / family.Reference };
    }
}
