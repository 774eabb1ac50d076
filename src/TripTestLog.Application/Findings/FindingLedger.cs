using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>
/// One device's findings as its tests are walked in time order. A rule raises a finding on a subject (a point, a pole,
/// a path); raises in a row make one finding, first seen at the first. A later as-found test that no longer raises it
/// closes it. An as-left test that passes confirms a repair: the finding stays open, and in the history, at the
/// severity of a check, until an as-found test closes it.
/// </summary>
internal sealed class FindingLedger
{
    private readonly Dictionary<string, Finding> _open = new(StringComparer.Ordinal);
    private readonly List<Finding> _others = [];

    /// <summary>Raises <paramref name="finding"/> on <paramref name="subject"/>, or carries the open one forward to it.</summary>
    public void Raise(string subject, Finding finding)
    {
        if (_open.TryGetValue(subject, out var open))
        {
            _open[subject] = finding with
            {
                FirstSeen = open.FirstSeen,
                RestsOn = [.. open.RestsOn, .. finding.RestsOn.Where(r => !open.RestsOn.Contains(r))],
            };
        }
        else
        {
            _open[subject] = finding with { FirstSeen = finding.TestedAt.Date };
        }
    }

    /// <summary>An as-found test on <paramref name="subject"/> that no longer raises it closes its open finding.</summary>
    public void Clear(string subject, TestedAt at, Settler by)
    {
        if (_open.Remove(subject, out var open))
        {
            _others.Add(open with { Open = false, Settled = new Settlement(true, at.Date, by) });
        }
    }

    /// <summary>
    /// An as-left test on <paramref name="subject"/> that passes confirms the repair of its open finding. The finding's
    /// own action is done: its words (at the edge) keep what was found, from the first repair confirmed, and say what stands now.
    /// </summary>
    public void Confirm(string subject, TestedAt at, Settler by)
    {
        if (_open.TryGetValue(subject, out var open) && open.TestedAt.CompareTo(at) <= 0)
        {
            var settled = new Settlement(false, at.Date, by);
            _open[subject] = open with
            {
                Severity = Severity.Investigate,
                Repaired = open.Repaired ?? settled,
                Settled = settled,
            };
        }
    }

    /// <summary>Adds a finding that stands on its own (a forecast, a comparison): open, not carried forward.</summary>
    public void Add(Finding finding) => _others.Add(finding);

    /// <summary>Every finding: open ones, then closed, each in the order raised.</summary>
    public IReadOnlyList<Finding> All() => [.. _open.Values, .. _others];
}
