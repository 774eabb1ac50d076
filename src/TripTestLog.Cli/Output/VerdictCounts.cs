using TripTestLog.Application.Check;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Cli.Output;

/// <summary>Counts verdicts as tests stream past, for the summary line and the exit code.</summary>
internal sealed class VerdictCounts : IVerdictWriter
{
    private readonly long[] _counts = new long[Enum.GetValues<Verdict>().Length];

    public long Total { get; private set; }

    public bool AnyFinding { get; private set; }

    public void Add(JudgedTrip judged)
    {
        Total++;
        _counts[(int)judged.Assessment.Verdict]++;
        AnyFinding |= judged.IsFinding;
    }

    public void Finish()
    {
    }

    /// <summary>"1959 trip tests: 1956 pass, 0 too-early, ..."</summary>
    public string Summary(string lead) =>
        $"{lead} {Total} trip tests: {string.Join(", ", Enum.GetValues<Verdict>().Select(v => $"{_counts[(int)v]} {Format.Verdict(v)}"))}.";
}
