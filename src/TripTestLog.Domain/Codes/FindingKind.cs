namespace TripTestLog.Domain.Codes;

/// <summary>What a finding is about; its text code is in <see cref="TextCodes.FindingKind"/>.</summary>
public enum FindingKind
{
    /// <summary>A trip verdict is too early or too late.</summary>
    TripOutOfBand,

    /// <summary>A measurement's registered instrument was out of calibration on the test date.</summary>
    CalibrationLapsed,

    /// <summary>A measurement's instrument is not in the register (when the lab requires registered instruments).</summary>
    InstrumentUnregistered,
}
