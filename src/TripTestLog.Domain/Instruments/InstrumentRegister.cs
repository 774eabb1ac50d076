namespace TripTestLog.Domain.Instruments;

/// <summary>
/// Every calibration period of every registered instrument. A measurement is traceable when its instrument was in a
/// calibration period on the test date; a lab may also require every instrument to be registered.
/// </summary>
public sealed class InstrumentRegister(IReadOnlyList<InstrumentCalibration> calibrations)
{
    private readonly ILookup<string, InstrumentCalibration> _byName = calibrations.ToLookup(c => c.Instrument, StringComparer.Ordinal);

    /// <summary>An empty register.</summary>
    public static InstrumentRegister Empty { get; } = new([]);

    /// <summary>The calibration period of <paramref name="instrument"/> that covers <paramref name="date"/>, or null.</summary>
    public InstrumentCalibration? PeriodOn(string instrument, DateOnly date) =>
        _byName[instrument].Where(p => p.CalibratedOn <= date && date <= p.CalibrationDue).OrderByDescending(p => p.CalibratedOn).FirstOrDefault();

    /// <summary>
    /// The finding for a measurement taken with <paramref name="instrument"/> on <paramref name="date"/>, or null when it
    /// is traceable. An instrument left blank or unregistered is a finding only when <paramref name="requireRegistered"/>.
    /// </summary>
    public string? Check(string instrument, DateOnly date, bool requireRegistered) => Trace(instrument, date, requireRegistered)?.Message;

    /// <summary>As <see cref="Check"/>, with whether the instrument was out of calibration or not registered at all.</summary>
    public UntracedInstrument? Trace(string instrument, DateOnly date, bool requireRegistered)
    {
        if (instrument.Length == 0)
        {
            return requireRegistered ? new(false, "no instrument recorded; the lab requires registered instruments") : null;
        }

        var periods = _byName[instrument].ToList();
        if (periods.Count == 0)
        {
            return requireRegistered ? new(false, $"instrument {instrument} is not in the instrument register") : null;
        }

        if (periods.Any(p => p.CalibratedOn <= date && date <= p.CalibrationDue))
        {
            return null;
        }

        var before = periods.Where(p => p.CalibrationDue < date).OrderByDescending(p => p.CalibrationDue).FirstOrDefault();
        return new(true, before is not null
            ? $"instrument {instrument} calibration lapsed on {before.CalibrationDue:yyyy-MM-dd}"
            : $"instrument {instrument} had no calibration yet on this date (first calibrated {periods.Min(p => p.CalibratedOn):yyyy-MM-dd})");
    }
}

/// <summary>Why a measurement's instrument was not traceable on the test date.</summary>
/// <param name="Registered">True when the instrument is registered but was out of calibration; false when it is not registered (or none was recorded).</param>
/// <param name="Message">Plain words.</param>
public sealed record UntracedInstrument(bool Registered, string Message);
