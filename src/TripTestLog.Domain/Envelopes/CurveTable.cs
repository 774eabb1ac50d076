namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// A band entered by the lab from a maker's published time-current curve: rows of current multiple with the minimum and
/// maximum trip time. Rows rise in current; both columns fall (or stay); minimum never above maximum; an unbounded
/// maximum only before the first bounded one.
/// </summary>
public sealed record CurveTable
{
    private CurveTable(string name, IReadOnlyList<CurveTablePoint> points)
    {
        Name = name;
        Points = points;
    }

    /// <summary>The table's name, which device entries refer to.</summary>
    public string Name { get; }

    /// <summary>The rows, in rising current.</summary>
    public IReadOnlyList<CurveTablePoint> Points { get; }

    /// <summary>Creates a table; throws <see cref="ArgumentException"/> naming the first row that breaks a rule.</summary>
    public static CurveTable Create(string name, IReadOnlyList<CurveTablePoint> points)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(points);
        if (points.Count < 2)
        {
            throw new ArgumentException($"curve table {name} needs at least two rows", nameof(points));
        }

        for (var i = 0; i < points.Count; i++)
        {
            if (Problem(points, i) is { } why)
            {
                throw new ArgumentException($"curve table {name}, row {i + 1}: {why}", nameof(points));
            }
        }

        return new CurveTable(name, points);
    }

    /// <summary>What is wrong with row <paramref name="i"/> given the rows before it, or null.</summary>
    public static string? Problem(IReadOnlyList<CurveTablePoint> points, int i)
    {
        var p = points[i];
        if (p.Maximum is { } max && p.Minimum > max)
        {
            return "the minimum time is above the maximum";
        }

        if (i == 0)
        {
            return null;
        }

        var q = points[i - 1];
        if (p.Multiple <= q.Multiple)
        {
            return "multiples must rise from row to row";
        }

        if (p.Minimum > q.Minimum)
        {
            return "the minimum time must not rise with current";
        }

        return (q.Maximum, p.Maximum) switch
        {
            ({ } before, { } now) when now > before => "the maximum time must not rise with current",
            ({ }, null) => "an unbounded maximum may only come before the first bounded one",
            _ => null,
        };
    }
}
