using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// The band of a lab-entered curve table, as multiples of the device's rated current. Each row is a requirement the lab
/// registered from the maker's data, carried in the direction physics gives it: a row's minimum holds at every lower
/// current, its maximum at every higher one (guaranteed edges). The straight log-log lines between rows (linear in time
/// where a minimum reaches zero) are typical edges, for advisories only. Makers draw these curves from cold with every
/// pole loaded, so the rows assume that.
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

    /// <inheritdoc />
    public TripBand At(Amperes current)
    {
        var m = current / Reference;
        var x = current.Value / (_reference.Value * _thermalFactor);
        var rows = _table.Points;
        var minimums = new List<BandEdge>();
        var maximums = new List<BandEdge>();

        // The nearest row at or above the current bounds the minimum; the nearest at or below bounds the maximum.
        var above = rows.Select((r, k) => (r, k)).FirstOrDefault(p => p.r.Multiple.Value >= x * (1 - 1e-9));
        var below = rows.Select((r, k) => (r, k)).LastOrDefault(p => p.r.Multiple.Value <= x * (1 + 1e-9));
        if (above.r is { } up && up.Minimum.Value > 0)
        {
            minimums.Add(Row(up.Minimum, up, carried: up.Multiple.Value > x * (1 + 1e-9), "minimum", "lower"));
        }

        if (below.r is { Maximum: { } max } lo)
        {
            maximums.Add(Row(max, lo, carried: lo.Multiple.Value < x * (1 - 1e-9), "maximum", "higher"));
        }

        if (above.r is { } u && below.r is { } l && u != l)
        {
            var why = $"curve table {_table.Name}, line between rows {l.Multiple} and {u.Multiple} In";
            var min = Between(x, l.Multiple.Value, l.Minimum.Value, u.Multiple.Value, u.Minimum.Value);
            if (min > 0)
            {
                minimums.Add(Typical(min, why));
            }

            if ((l.Maximum, u.Maximum) is ({ } a, { } b))
            {
                maximums.Add(Typical(Between(x, l.Multiple.Value, a.Value, u.Multiple.Value, b.Value), why));
            }
        }

        return TripBand.Of(current, m, minimums, maximums, $"curve table {_table.Name} sets no limit at {x:0.###} In");
    }

    private BandEdge Row(Seconds limit, CurveTablePoint row, bool carried, string side, string direction) =>
        new(limit, EdgeSource.CurveTable,
            $"curve table {_table.Name}, row {row.Multiple} In {side}{(carried ? $", carried to {direction} currents" : "")}", StartCondition.Cold)
        {
            Loading = PoleLoading.AllPoles, Anchor = row.Multiple.Value * _thermalFactor, Carried = carried,
        };

    private static BandEdge Typical(double seconds, string why) =>
        new(Seconds.Of(seconds), EdgeSource.Interpolated, why, StartCondition.Cold) { Strength = EdgeStrength.Typical, Loading = PoleLoading.AllPoles };

    private static double Between(double x, double x0, double t0, double x1, double t1) =>
        t0 > 0 && t1 > 0 ? LogLog.Interpolate(x, x0, t0, x1, t1) : t0 + (t1 - t0) * (x - x0) / (x1 - x0);
}
