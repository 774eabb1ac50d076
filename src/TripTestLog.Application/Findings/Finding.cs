using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Application.Findings;

/// <summary>
/// Something a person should act on or look into, as a typed value: what kind, how urgent, the requirement or policy it
/// rests on, and the records it rests on. Prose is made from it at the edge.
/// </summary>
/// <param name="Kind">What the finding is about.</param>
/// <param name="Severity">How urgently it asks for action.</param>
/// <param name="Asset">The device.</param>
/// <param name="TestedAt">The latest test it rests on.</param>
/// <param name="Basis">The standard's requirement or the lab policy it comes from.</param>
/// <param name="Message">Plain words a technician can act on.</param>
/// <param name="RestsOn">The stored records it rests on: file and line.</param>
public sealed record Finding(
    FindingKind Kind,
    Severity Severity,
    AssetTag Asset,
    TestedAt TestedAt,
    string Basis,
    string Message,
    IReadOnlyList<RecordSource> RestsOn)
{
    /// <summary>The pole it concerns (contact resistance), when it concerns one.</summary>
    public string? Pole { get; init; }

    /// <summary>The insulation path it concerns, when it concerns one.</summary>
    public string? Path { get; init; }

    /// <summary>The trip test point it concerns, e.g. "2.55 In cold", when it concerns one.</summary>
    public string? Point { get; init; }

    /// <summary>What it concerns in words: "pole 1", "path 1-E", "at 2.55 In cold", or "" for the whole device.</summary>
    public string Concerns => Pole is not null ? $"pole {Pole}" : Path is not null ? $"path {Path}" : Point is not null ? $"at {Point}" : "";

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

    /// <summary>What changed its standing: the later test that closed it, or the as-left test that confirms a repair.</summary>
    public string? Standing { get; init; }

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
