using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// A curve table laid over a family's envelope: every requirement of both holds, so the band at a current is the union
/// of their edges and the tightest applicable edge decides. The maker's curve can narrow the standard's band, never
/// widen it. The family's points and thermal split stay the family's.
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
        var own = family.At(current);
        var drawn = table.At(current);
        return TripBand.Of(current, own.Multiple, [.. own.Minimums, .. drawn.Minimums], [.. own.Maximums, .. drawn.Maximums],
            own.NoRequirement ?? drawn.NoRequirement ?? "no requirement here");
    }
}
