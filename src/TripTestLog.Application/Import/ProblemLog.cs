using TripTestLog.Application.Records;

namespace TripTestLog.Application.Import;

/// <summary>
/// The problems of one file as an import finds them: every refused line is counted, and the first
/// <see cref="Kept"/> problems are kept for the report, so a file of a million bad rows does not fill memory.
/// </summary>
internal sealed class ProblemLog
{
    /// <summary>How many problems are kept for the report; the rest are counted.</summary>
    public const int Kept = 10_000;

    private readonly List<RowProblem> _problems = [];
    private long _lastLine = -1;

    public long RefusedLines { get; private set; }

    public long Omitted { get; private set; }

    public bool Any => _problems.Count > 0 || Omitted > 0;

    public IReadOnlyList<RowProblem> Problems => _problems;

    public void Add(IEnumerable<RowProblem> problems)
    {
        foreach (var p in problems)
        {
            if (p.Line > 1 && p.Line != _lastLine)
            {
                RefusedLines++;
                _lastLine = p.Line;
            }

            if (_problems.Count < Kept)
            {
                _problems.Add(p);
            }
            else
            {
                Omitted++;
            }
        }
    }
}
