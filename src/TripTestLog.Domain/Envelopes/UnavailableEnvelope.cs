using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>Stands in where a device's envelope cannot be built (e.g. its curve table is missing): every band says why.</summary>
public sealed class UnavailableEnvelope(string standard, Amperes reference, string reason) : ITripEnvelope
{
    /// <inheritdoc />
    public string Standard => standard;

    /// <summary>Why no band can be drawn, and what to do about it.</summary>
    public string Reason => reason;

    /// <inheritdoc />
    public string ReferenceName => "In";

    /// <inheritdoc />
    public Amperes Reference => reference;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => [];

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => false;

    /// <inheritdoc />
    public TripBand At(Amperes current) =>
        TripBand.None(current, current / reference, reason);
}
