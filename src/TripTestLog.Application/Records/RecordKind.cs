namespace TripTestLog.Application.Records;

/// <summary>The kinds of record file, recognised from the header row, never from the file name.</summary>
public enum RecordKind
{
    /// <summary>The device register: one row per breaker.</summary>
    DeviceRegister,

    /// <summary>Primary-injection trip tests.</summary>
    TripTests,

    /// <summary>Contact (micro-ohm) resistance readings.</summary>
    ContactResistance,

    /// <summary>Insulation resistance readings.</summary>
    InsulationResistance,

    /// <summary>A band entered from a maker's curve: rows of current multiple, minimum and maximum time.</summary>
    CurveTable,

    /// <summary>A maker's ambient derating table: rows of ambient temperature and current factor.</summary>
    AmbientTable,

    /// <summary>The instrument register: test sets and their calibration periods.</summary>
    InstrumentRegister,
}
