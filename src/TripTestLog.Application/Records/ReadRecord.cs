using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Application.Records;

/// <summary>
/// One record as a file or a store gives it: one type a kind of record, so the import and transfer ports pass typed
/// records. The set is closed (no other assembly can add a kind), but the compiler cannot prove a switch over it
/// complete: every switch ends in a case that throws, so a kind one of them missed fails loudly.
/// </summary>
public abstract record ReadRecord
{
    private protected ReadRecord()
    {
    }
}

/// <summary>A register entry: one breaker as the register describes it from a date on.</summary>
/// <param name="Device">The entry.</param>
public sealed record RegisterRecord(Device Device) : ReadRecord;

/// <summary>A measurement of one device (a trip test, a contact or an insulation reading).</summary>
public abstract record MeasurementRecord : ReadRecord
{
    private protected MeasurementRecord()
    {
    }

    /// <summary>The measurement.</summary>
    public abstract IMeasurement Measurement { get; }

    /// <summary>The device it was made on.</summary>
    public AssetTag Tag => Measurement.Tag;
}

/// <summary>A primary-injection trip test.</summary>
/// <param name="Trip">The test.</param>
public sealed record TripRecord(TripMeasurement Trip) : MeasurementRecord
{
    /// <inheritdoc />
    public override IMeasurement Measurement => Trip;
}

/// <summary>A contact (micro-ohm) resistance reading.</summary>
/// <param name="Contact">The reading.</param>
public sealed record ContactRecord(ContactMeasurement Contact) : MeasurementRecord
{
    /// <inheritdoc />
    public override IMeasurement Measurement => Contact;
}

/// <summary>An insulation resistance reading.</summary>
/// <param name="Insulation">The reading.</param>
public sealed record InsulationRecord(InsulationMeasurement Insulation) : MeasurementRecord
{
    /// <inheritdoc />
    public override IMeasurement Measurement => Insulation;
}

/// <summary>One point of a curve table.</summary>
/// <param name="Row">The point, with the table it belongs to.</param>
public sealed record CurveRowRecord(CurveTableRow Row) : ReadRecord;

/// <summary>One point of an ambient table.</summary>
/// <param name="Row">The point, with the table it belongs to.</param>
public sealed record AmbientRowRecord(AmbientTableRow Row) : ReadRecord;

/// <summary>One calibration of the instrument register.</summary>
/// <param name="Calibration">The calibration.</param>
public sealed record CalibrationRecord(InstrumentCalibration Calibration) : ReadRecord;
