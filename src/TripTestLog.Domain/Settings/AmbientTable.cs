using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Settings;

/// <summary>One row of an ambient correction table: at this ambient the thermal release acts as at reference with the current scaled by <see cref="CurrentFactor"/>.</summary>
/// <param name="Ambient">Ambient temperature.</param>
/// <param name="CurrentFactor">The maker's derating factor on the current setting (1 at the reference ambient).</param>
public sealed record AmbientPoint(Celsius Ambient, double CurrentFactor);

/// <summary>
/// A maker's ambient derating table entered by the lab. Between rows the factor is linear in temperature; outside the
/// table there is no correction.
/// </summary>
public sealed record AmbientTable
{
    private AmbientTable(string name, IReadOnlyList<AmbientPoint> points)
    {
        Name = name;
        Points = points;
    }

    /// <summary>The table's name, which device entries refer to.</summary>
    public string Name { get; }

    /// <summary>The rows, in rising temperature.</summary>
    public IReadOnlyList<AmbientPoint> Points { get; }

    /// <summary>Creates a table; throws <see cref="ArgumentException"/> unless temperatures rise and factors lie in 0.5 to 1.5.</summary>
    public static AmbientTable Create(string name, IReadOnlyList<AmbientPoint> points)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(points);
        if (points.Count < 2)
        {
            throw new ArgumentException($"ambient table {name} needs at least two rows", nameof(points));
        }

        for (var i = 0; i < points.Count; i++)
        {
            if (points[i].CurrentFactor is < 0.5 or > 1.5)
            {
                throw new ArgumentException($"ambient table {name}, row {i + 1}: factor must lie between 0.5 and 1.5", nameof(points));
            }

            if (i > 0 && points[i].Ambient.Value <= points[i - 1].Ambient.Value)
            {
                throw new ArgumentException($"ambient table {name}, row {i + 1}: temperatures must rise from row to row", nameof(points));
            }
        }

        return new AmbientTable(name, points);
    }

    /// <summary>The factor at <paramref name="ambient"/>, or null outside the table.</summary>
    public double? FactorAt(Celsius ambient)
    {
        var t = ambient.Value;
        if (t < Points[0].Ambient.Value || t > Points[^1].Ambient.Value)
        {
            return null;
        }

        for (var i = 1; i < Points.Count; i++)
        {
            var (a, b) = (Points[i - 1], Points[i]);
            if (t <= b.Ambient.Value)
            {
                return a.CurrentFactor + (b.CurrentFactor - a.CurrentFactor) * (t - a.Ambient.Value) / (b.Ambient.Value - a.Ambient.Value);
            }
        }

        return Points[^1].CurrentFactor;
    }
}
