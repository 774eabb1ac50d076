using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Devices;

/// <summary>A breaker as the register describes it. Immutable; a register re-import yields a new value.</summary>
/// <param name="Tag">Unique key.</param>
/// <param name="Site">Site name.</param>
/// <param name="Location">Where on the site (board, panel, way).</param>
/// <param name="Family">Breaker family, deciding the standard applied.</param>
/// <param name="Curve">Instantaneous tripping type for IEC 60898-1 devices.</param>
/// <param name="RatedCurrent">Rated current In.</param>
/// <param name="Poles">Number of protected poles, 1 to 4.</param>
/// <param name="RatedVoltage">Rated operational voltage.</param>
/// <param name="CommissionedOn">Date the device went into service, when known.</param>
/// <param name="ContactLimit">Highest acceptable contact resistance per pole, from the maker's data, when known.</param>
/// <param name="Make">Free-text maker name.</param>
/// <param name="Model">Free-text model.</param>
/// <param name="Serial">Free-text serial number.</param>
public sealed record Device(
    AssetTag Tag,
    string Site,
    string Location,
    DeviceFamily Family,
    TripCurve Curve,
    Amperes RatedCurrent,
    int Poles,
    Volts RatedVoltage,
    DateOnly? CommissionedOn,
    MicroOhms? ContactLimit,
    string Make,
    string Model,
    string Serial);
