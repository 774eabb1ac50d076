namespace TripTestLog.Domain.Envelopes;

/// <summary>
/// Composes a band from several protective functions. The earliest allowed trip is the earliest minimum of the
/// functions that could act at this current; the latest allowed trip is the earliest maximum of those that must act.
/// Each function's edges fall with current and a function must act only where it could, so the composed edges fall
/// with current and the minimum never passes the maximum.
/// </summary>
internal sealed class EdgeCandidates
{
    private readonly List<BandEdge> _minimums = [];
    private readonly List<BandEdge> _maximums = [];

    public void CouldAct(BandEdge minimum) => _minimums.Add(minimum);

    public void MustAct(BandEdge maximum) => _maximums.Add(maximum);

    /// <summary>The earliest minimum; <paramref name="whenNone"/> when no function could act.</summary>
    public BandEdge Minimum(BandEdge whenNone) =>
        _minimums.Count == 0 ? whenNone : _minimums.MinBy(e => e.Limit?.Value ?? double.PositiveInfinity);

    /// <summary>The earliest maximum; unbounded when no function must act.</summary>
    public BandEdge Maximum(string whyNone) =>
        _maximums.Count == 0 ? BandEdge.NoMaximum(whyNone) : _maximums.MinBy(e => e.Limit!.Value.Value);
}
