using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Something a person should act on or look into, as a typed value: what kind, how urgent, what the rule found (the
/// numbers, the policy's numbers and the requirement it rests on, in <see cref="Facts"/>), and the records it rests on.
/// Prose is made from it at the edge: the wording module (TripTestLog.Wording) gives its basis, message, standing and
/// what it concerns.
/// </summary>
/// <param name="Kind">What the finding is about.</param>
/// <param name="Severity">How urgently it asks for action.</param>
/// <param name="Asset">The device.</param>
/// <param name="TestedAt">The latest test it rests on.</param>
/// <param name="Facts">What the rule found, as values.</param>
/// <param name="RestsOn">The stored records it rests on: file and line.</param>
public sealed record Finding(
    FindingKind Kind,
    Severity Severity,
    AssetTag Asset,
    TestedAt TestedAt,
    FindingFacts Facts,
    IReadOnlyList<RecordSource> RestsOn)
{
    /// <summary>A finding whose words are given whole (<see cref="GivenWords"/>), for a caller that holds them already.</summary>
    /// <param name="kind">What the finding is about.</param>
    /// <param name="severity">How urgently it asks for action.</param>
    /// <param name="asset">The device.</param>
    /// <param name="testedAt">The latest test it rests on.</param>
    /// <param name="basis">The requirement or policy it rests on, in words.</param>
    /// <param name="message">What to do, in words.</param>
    /// <param name="restsOn">The stored records it rests on.</param>
    public Finding(FindingKind kind, Severity severity, AssetTag asset, TestedAt testedAt, string basis, string message, IReadOnlyList<RecordSource> restsOn)
        : this(kind, severity, asset, testedAt, new GivenWords(basis, message), restsOn)
    {
    }

    /// <summary>The pole it concerns (contact resistance), when it concerns one.</summary>
    public string? Pole { get; init; }

    /// <summary>The insulation path it concerns, when it concerns one.</summary>
    public string? Path { get; init; }

    /// <summary>The trip test point it concerns, e.g. "2.55 In cold", when it concerns one.</summary>
    public string? Point { get; init; }

    /// <summary>The value the rule judged, with its unit.</summary>
    public Reading? Value { get; init; }

    /// <summary>The limit it was judged against, in the same unit.</summary>
    public Reading? Limit { get; init; }

    /// <summary>The lab policy setting the rule used, as "key = value"; null when the rule rests on a standard alone.</summary>
    public string? Policy { get; init; }

    /// <summary>The first test of the run of tests that raised it.</summary>
    public DateOnly? FirstSeen { get; init; }

    /// <summary>For a forecast, the date the trend reaches the edge or limit.</summary>
    public DateOnly? ForecastOn { get; init; }

    /// <summary>False once a later as-found test no longer raises it.</summary>
    public bool Open { get; init; } = true;

    /// <summary>
    /// For a forecast, the robust trend line it rests on, in the rule's own scale: log10 of seconds (trip times),
    /// micro-ohms (contact resistance) or log10 of megohms (insulation), against the fractional year.
    /// </summary>
    public TrendLine? Trend { get; init; }

    /// <summary>The instrument an instrument finding is about.</summary>
    public string? Instrument { get; init; }

    /// <summary>What changed its standing last: the later as-found test that closed it, or an as-left test that confirms a repair.</summary>
    public Settlement? Settled { get; init; }

    /// <summary>The first as-left test that confirmed a repair of it while it stayed open; its words then keep what was found.</summary>
    public Settlement? Repaired { get; init; }

    /// <summary>
    /// For a value referred to a reference temperature, the reading as measured, in the value's unit; null where the
    /// value is not a corrected reading.
    /// </summary>
    public Reading? Measured { get; init; }

    /// <summary>The rule that referred <see cref="Value"/> to its reference temperature, as "key = value" or in words.</summary>
    public string? Correction { get; init; }

    /// <summary>For a trend, how many of the readings it rests on (or that were left out) came from an untraceable instrument.</summary>
    public int? UntraceableReadings { get; init; }
}

/// <summary>Where a stored record came from.</summary>
/// <param name="File">The file it was imported from.</param>
/// <param name="Line">Its line in that file.</param>
public sealed record RecordSource(string File, long Line);
