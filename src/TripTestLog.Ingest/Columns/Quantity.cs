using TripTestLog.Application.Records;
namespace TripTestLog.Ingest.Columns;

/// <summary>What a numeric column measures, which decides the unit suffixes it accepts.</summary>
internal enum Quantity
{
    /// <summary>Free text, a date, a code: no unit suffix.</summary>
    None,

    /// <summary>Current: _a, _ka.</summary>
    Current,

    /// <summary>Time: _s, _ms.</summary>
    Time,

    /// <summary>Contact resistance: _uohm (micro-ohm), _mohm (milli-ohm).</summary>
    ContactResistance,

    /// <summary>Insulation resistance: _mohm (megohm), _gohm (gigohm).</summary>
    InsulationResistance,

    /// <summary>Voltage: _v, _kv.</summary>
    Voltage,

    /// <summary>Temperature: _c.</summary>
    Temperature,

    /// <summary>A plain count, e.g. poles: no suffix.</summary>
    Count,
}
