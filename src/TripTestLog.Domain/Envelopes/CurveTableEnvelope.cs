using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of a lab-entered curve table, as multiples of the device's rated current: straight log-log lines between
/// rows (linear in current where a minimum reaches zero); outside the table's range the band is not defined.
/// </summary>
public sealed class CurveTableEnvelope : ITripEnvelope
{
    private readonly CurveTable _table;
    private readonly Amperes _reference;
    private readonly double _thermalFactor;

    /// <summary>Creates the envelope; <paramref name="thermalFactor"/> scales the table's currents for ambient (0.5 to 1.5).</summary>
    public CurveTableEnvelope(CurveTable table, Amperes reference, double thermalFactor = 1.0)
    {
        ArgumentNullException.ThrowIfNull(table);
        _table = table;
        _reference = reference;
        _thermalFactor = Guard.InRange(thermalFactor, 0.5, 1.5, nameof(thermalFactor), "(factor)");
    }

    /// <inheritdoc />
    public string Standard => $"curve table {_table.Name}";

    /// <inheritdoc />
    public string ReferenceName => "In";

    /// <inheritdoc />
    public Amperes Reference => _reference;

    /// <inheritdoc />
    public IReadOnlyList<NormativePoint> Points => [];

    /// <inheritdoc />
    public bool IsThermal(Amperes current) => true;

    /// <summary>Whether the table covers <paramref name="current"/>.</summary>
    public bool Covers(Amperes current)
    {
        var x = current.Value / (_reference.Value * _thermalFactor);
        return x >= _table.Points[0].Multiple.Value * (1 - 1e-9) && x <= _table.Points[^1].Multiple.Value * (1 + 1e-9);
    }

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var x = current.Value / (_reference.Value * _thermalFactor);
        var rows = _table.Points;
        if (!Covers(current))
        {
            var none = $"outside curve table {_table.Name} ({rows[0].Multiple} to {rows[^1].Multiple} In)";
            return new TripBand(current, m, BandEdge.NoMinimum(none), BandEdge.NoMaximum(none), none);
        }

        var hi = 1;
        while (hi < rows.Count - 1 && rows[hi].Multiple.Value < x)
        {
            hi++;
        }

        var lo = rows[hi - 1];
        var up = rows[hi];
        var why = $"curve table {_table.Name}, rows {lo.Multiple} to {up.Multiple} In";
        var min = Between(x, lo.Multiple.Value, lo.Minimum.Value, up.Multiple.Value, up.Minimum.Value);
        var minimum = min <= 0 ? BandEdge.NoMinimum(why) : new BandEdge(Seconds.Of(min), EdgeSource.CurveTable, why, StartCondition.Cold);
        BandEdge maximum = (lo.Maximum, up.Maximum) switch
        {
            ({ } a, { } b) => new BandEdge(Seconds.Of(Between(x, lo.Multiple.Value, a.Value, up.Multiple.Value, b.Value)), EdgeSource.CurveTable, why, StartCondition.Cold),
            (null, { } b) when x >= up.Multiple.Value => new BandEdge(b, EdgeSource.CurveTable, why, StartCondition.Cold),
            _ => BandEdge.NoMaximum(why + ": no trip required"),
        };
        return new TripBand(current, m, minimum, maximum, null);
    }

    private static double Between(double x, double x0, double t0, double x1, double t1) =>
        t0 > 0 && t1 > 0 ? LogLog.Interpolate(x, x0, t0, x1, t1) : t0 + (t1 - t0) * (x - x0) / (x1 - x0);
}
