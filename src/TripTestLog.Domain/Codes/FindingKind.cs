namespace TripTestLog.Domain.Codes;

/// <summary>What a finding is about; its text code is in <see cref="TextCodes.FindingKind"/>, its rule in the README.</summary>
public enum FindingKind
{
    /// <summary>The latest as-found trip verdict at a point is too early or too late.</summary>
    TripOutOfBand,

    /// <summary>The as-found trip time at a point has moved beyond the policy's threshold from the device's baseline.</summary>
    TripDrift,

    /// <summary>A robust trend of the as-found trip times at a point leaves the band before the next test is due.</summary>
    TripTrendExit,

    /// <summary>A result far from those of the device's peers at the same point.</summary>
    PeerOutlier,

    /// <summary>A pole's contact resistance, referred to 20 °C, is over the device's limit.</summary>
    ContactOverLimit,

    /// <summary>A pole reads more than the policy's percentage above the device's lowest pole at the same test.</summary>
    ContactPoleSpread,

    /// <summary>A pole's contact resistance has risen more than the policy's percentage over its baseline.</summary>
    ContactRise,

    /// <summary>A robust trend of a pole's contact resistance reaches the limit before the next test is due.</summary>
    ContactTrendLimit,

    /// <summary>A contact resistance test current below what is common for the rating.</summary>
    ContactLowTestCurrent,

    /// <summary>An insulation reading, referred to 20 °C, below the minimum of the policy's table.</summary>
    InsulationBelowMinimum,

    /// <summary>A falling trend of one path's insulation resistance.</summary>
    InsulationFalling,

    /// <summary>A measurement's registered instrument was out of calibration on the test date.</summary>
    CalibrationLapsed,

    /// <summary>A measurement's instrument is not in the register (when the lab requires registered instruments).</summary>
    InstrumentUnregistered,

    /// <summary>Settings read off the device at a test differ from the register entry in force.</summary>
    SettingsDiffer,

    /// <summary>No as-found test since the device's due date.</summary>
    TestOverdue,

    /// <summary>A trip test neither broke nor proved a requirement: the test that would decide is still to be run.</summary>
    RetestNeeded,

    /// <summary>An insulation test made at a lower DC voltage than the policy's table asks for the breaker's rated voltage.</summary>
    InsulationTestVoltage,

    /// <summary>A result within the measurement uncertainty of its limit: a test with a more accurate instrument would decide.</summary>
    RetestAccuracy,
}
