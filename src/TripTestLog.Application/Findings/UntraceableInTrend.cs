using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Readings from an instrument that was not traceable on the day, as trends treat them under the lab policy: kept and
/// marked, or left out. The reading itself is still judged; only the line through many readings is at stake.
/// </summary>
internal static class UntraceableInTrend
{
    /// <summary>Whether <paramref name="instrument"/> was traceable on <paramref name="date"/> under the lab's policy.</summary>
    public static bool Traceable(InstrumentRegister instruments, FindingPolicy policy, string instrument, DateOnly date) =>
        instruments.Trace(instrument, date, policy.RequireRegisteredInstruments) is null;

    /// <summary>The readings a trend rests on: all of them, or only the traceable ones where the policy excludes the rest.</summary>
    public static List<T> Kept<T>(IEnumerable<T> readings, Func<T, bool> traceable, FindingPolicy policy) =>
        policy.UntraceableReadings == UntraceableReadings.Exclude ? [.. readings.Where(traceable)] : [.. readings];

    /// <summary>How many readings of a trend were untraceable, with what the policy did with them, for the edge to word.</summary>
    public static UntraceableShare Share(int untraceable, int kept, FindingPolicy policy) => new(untraceable, kept, policy.UntraceableReadings);
}
