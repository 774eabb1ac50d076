using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>The decision rule on a reading against a limit, shared by the contact and insulation rules.</summary>
internal static class Uncertain
{
    /// <summary>The guard band w for an expanded uncertainty <paramref name="expanded"/>: the policy's multiple of it.</summary>
    public static double Guard(FindingPolicy policy, double expanded) => policy.GuardBandFactor * expanded;

    /// <summary>Raises the retest-accuracy finding <paramref name="make"/> when <paramref name="within"/>, else clears it on an as-found test.</summary>
    public static void Settle(FindingLedger ledger, string subject, bool within, bool asFound, TestedAt at, Func<Finding> make)
    {
        if (within)
        {
            ledger.Raise(subject, make());
        }
        else if (asFound)
        {
            ledger.Clear(subject, at, new Settler.ReadingClearOfUncertainty());
        }
    }
}
