using TripTestLog.Domain.Condition;

namespace TripTestLog.Application.Findings;

/// <summary>
/// What a rule found, as values: the numbers it judged, the policy's numbers it judged them by, and which requirement
/// applies. A closed set: each rule has its own record (<see cref="TripFacts"/>, <see cref="ContactFacts"/>,
/// <see cref="InsulationFacts"/>, <see cref="InstrumentFacts"/>, <see cref="DeviceFacts"/>); the sentences are made
/// from them at the edge, by the one wording module every writer of findings uses.
/// </summary>
public abstract record FindingFacts;

/// <summary>A finding whose words were given whole, by a caller that holds them already rather than a rule.</summary>
/// <param name="Basis">The requirement or policy it rests on, in words.</param>
/// <param name="Message">What to do, in words.</param>
public sealed record GivenWords(string Basis, string Message) : FindingFacts;

/// <summary>The dates a forecast is set against.</summary>
/// <param name="On">The date the trend reaches the edge or limit.</param>
/// <param name="Due">The device's one due date.</param>
/// <param name="AsOf">The day judged on; a forecast before it has probably been crossed already.</param>
public sealed record ForecastDates(DateOnly On, DateOnly Due, DateOnly AsOf);

/// <summary>How many of a trend's readings came from an instrument not traceable on the day, and what the policy did with them.</summary>
/// <param name="Untraceable">Readings from an untraceable instrument (kept or left out).</param>
/// <param name="Kept">Readings the trend rests on.</param>
/// <param name="Treatment">The policy's <c>untraceable_readings</c>: kept and marked, or left out.</param>
public sealed record UntraceableShare(int Untraceable, int Kept, UntraceableReadings Treatment);

/// <summary>The kinds of test whose instrument a finding can be about.</summary>
public enum TestKind
{
    /// <summary>Trip time tests.</summary>
    Trip,

    /// <summary>Contact resistance tests.</summary>
    Contact,

    /// <summary>Insulation resistance tests.</summary>
    Insulation,
}
