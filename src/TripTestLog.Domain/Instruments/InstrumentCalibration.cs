namespace TripTestLog.Domain.Instruments;

/// <summary>One calibration period of a test instrument, as the instrument register lists it.</summary>
/// <param name="Instrument">The name measurement records use for it, e.g. INJ-ARW-1.</param>
/// <param name="Kind">What it is, e.g. primary injection set, micro-ohm meter, insulation tester.</param>
/// <param name="Serial">Its serial number.</param>
/// <param name="CalibratedOn">The date of the calibration.</param>
/// <param name="CalibrationDue">The date the calibration lapses (the last day it is valid).</param>
public sealed record InstrumentCalibration(string Instrument, string Kind, string Serial, DateOnly CalibratedOn, DateOnly CalibrationDue)
{
    /// <summary>The accuracy the calibration states; <see cref="InstrumentAccuracy.None"/> when the register gives none.</summary>
    public InstrumentAccuracy Accuracy { get; init; } = InstrumentAccuracy.None;
}
