using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Devices;

/// <summary>A breaker as one register entry describes it. Immutable; a register re-import yields a new value.</summary>
/// <param name="Tag">Unique key.</param>
/// <param name="Site">Site name.</param>
/// <param name="Location">Where on the site (board, panel, way).</param>
/// <param name="Family">Breaker family, deciding the standard applied.</param>
/// <param name="RatedCurrent">Rated current In (for IEC 60947-2 breakers the frame rating; it sets the conventional time).</param>
/// <param name="Poles">Number of protected poles, 1 to 4.</param>
/// <param name="RatedVoltage">Rated operational voltage.</param>
/// <param name="CommissionedOn">Date the device went into service, when known.</param>
/// <param name="ContactLimit">Highest acceptable contact resistance per pole, from the maker's data, when known.</param>
/// <param name="Make">Free-text maker name.</param>
/// <param name="Model">Free-text model.</param>
/// <param name="Serial">Free-text serial number.</param>
/// <param name="Settings">The protection settings of this entry, of the family's kind.</param>
public sealed record Device(
    AssetTag Tag,
    string Site,
    string Location,
    DeviceFamily Family,
    Amperes RatedCurrent,
    int Poles,
    Volts RatedVoltage,
    DateOnly? CommissionedOn,
    MicroOhms? ContactLimit,
    string Make,
    string Model,
    string Serial,
    DeviceSettings Settings)
{
    /// <summary>The date these settings took effect; null when the entry does not say (then they hold from the start).</summary>
    public DateOnly? SettingsFrom { get; init; }

    /// <summary>A curve table entered from the maker's data that bands the device where its standard sets no band.</summary>
    public string? CurveTable { get; init; }

    /// <summary>The ambient the thermal release is calibrated at; null for the family's default.</summary>
    public Celsius? ReferenceAmbient { get; init; }

    /// <summary>An ambient correction (derating) table from the maker's data, when the lab has entered one.</summary>
    public string? AmbientTable { get; init; }

    /// <summary>
    /// How much the site depends on it, 1 (highest: an incomer, a supply whose loss stops the site) to 3 (lowest: a
    /// final circuit); <see cref="DefaultCriticality"/> when the register does not say. Orders devices within a grade.
    /// </summary>
    public int Criticality { get; init; } = DefaultCriticality;

    /// <summary>The criticality of a device whose register entry gives none: 2, the middle.</summary>
    public const int DefaultCriticality = 2;

    /// <summary>The highest criticality, 1.</summary>
    public const int HighestCriticality = 1;

    /// <summary>The lowest criticality, 3.</summary>
    public const int LowestCriticality = 3;
}
