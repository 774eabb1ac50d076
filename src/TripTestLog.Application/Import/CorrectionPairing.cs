namespace TripTestLog.Application.Import;

/// <summary>
/// Lines up a correction with the file it corrects, as a line diff does. Rows whose content both files hold are
/// anchors (old line, new line). Between two anchors, the corrected file's records the new file no longer holds and
/// the records the new file added are paired in order: each pair is one record corrected. What is left over on the
/// old side is kept (and reported); on the new side, added.
/// </summary>
public static class CorrectionPairing
{
    /// <summary>The pairs (old record id, new record id), and the old records left unpaired.</summary>
    /// <param name="anchors">Lines of records held again unchanged: (line in the earlier file, line in the new one).</param>
    /// <param name="old">The earlier file's records the new file does not hold: (id, line).</param>
    /// <param name="added">The records the new file added: (id, line).</param>
    public static (List<(long Old, long New)> Pairs, List<(long Id, long Line)> Left) Pair(
        IReadOnlyCollection<(long OldLine, long NewLine)> anchors, IEnumerable<(long Id, long Line)> old, IEnumerable<(long Id, long Line)> added)
    {
        var oldAnchors = anchors.Select(a => a.OldLine).Order().ToArray();
        var newAnchors = anchors.Select(a => a.NewLine).Order().ToArray();
        var waiting = added.OrderBy(a => a.Line).GroupBy(a => Gap(newAnchors, a.Line)).ToDictionary(g => g.Key, g => new Queue<(long Id, long Line)>(g));
        var pairs = new List<(long, long)>();
        var left = new List<(long, long)>();
        foreach (var record in old.OrderBy(o => o.Line))
        {
            if (waiting.TryGetValue(Gap(oldAnchors, record.Line), out var queue) && queue.TryDequeue(out var match))
            {
                pairs.Add((record.Id, match.Id));
            }
            else
            {
                left.Add(record);
            }
        }

        return (pairs, left);
    }

    // How many anchors come before the line: rows in the same gap between anchors belong to the same changed stretch.
    private static int Gap(long[] anchors, long line)
    {
        var at = Array.BinarySearch(anchors, line);
        return at >= 0 ? at : ~at;
    }
}
