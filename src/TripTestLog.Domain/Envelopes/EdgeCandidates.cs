namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// Composes the setting edges of several protective functions of one device. The earliest allowed trip is the earliest
/// minimum of the functions that could act at this current; the latest allowed trip is the earliest maximum of those that
/// must act. Each function's edges fall with current and a function must act only where it could, so the composed edges
/// fall with current and the minimum never passes the maximum.
/// </summary>
internal sealed class EdgeCandidates
{
    private readonly List<BandEdge> _minimums = [];
    private readonly List<BandEdge> _maximums = [];

    public void CouldAct(BandEdge minimum) => _minimums.Add(minimum);

    public void MustAct(BandEdge maximum) => _maximums.Add(maximum);

    /// <summary>The earliest minimum, or null when no function could act or one may act at once.</summary>
    public BandEdge? Minimum()
    {
        if (_minimums.Count == 0)
        {
            return null;
        }

        var earliest = _minimums.MinBy(e => e.Limit?.Value ?? double.PositiveInfinity);
        return earliest!.IsOpen ? null : earliest;
    }

    /// <summary>The earliest maximum, or null when no function must act.</summary>
    public BandEdge? Maximum() => _maximums.Count == 0 ? null : _maximums.MinBy(e => e.Limit!.Value.Value);
}
