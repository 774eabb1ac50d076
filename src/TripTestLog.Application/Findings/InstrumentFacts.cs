using TripTestLog.Domain.Instruments;

namespace TripTestLog.Application.Findings;

/// <summary>What the instrument rules find, as values.</summary>
public static class InstrumentFacts
{
    /// <summary>One trip test's instrument not traceable on the day, as the check reports it.</summary>
    /// <param name="Trace">Why, as the instrument register gives it.</param>
    public sealed record Untraced(UntracedInstrument Trace) : FindingFacts;

    /// <summary>A session's instrument not traceable on the day, as the findings report it.</summary>
    /// <param name="Tests">The kind of tests made with it.</param>
    /// <param name="On">The session's date.</param>
    /// <param name="Trace">Why, as the instrument register gives it.</param>
    public sealed record SessionUntraced(TestKind Tests, DateOnly On, UntracedInstrument Trace) : FindingFacts;
}
