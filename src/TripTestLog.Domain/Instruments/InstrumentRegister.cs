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
    /// The accuracy stated for <paramref name="instrument"/> on <paramref name="date"/>: of the periods covering the date,
    /// the last imported that states one; <see cref="InstrumentAccuracy.None"/> when none does.
    /// </summary>
    public InstrumentAccuracy AccuracyOn(string instrument, DateOnly date) =>
        _byName[instrument].LastOrDefault(p => p.CalibratedOn <= date && date <= p.CalibrationDue && !p.Accuracy.IsEmpty)?.Accuracy ?? InstrumentAccuracy.None;

    /// <summary>Whether any calibration period of <paramref name="instrument"/> states an accuracy figure.</summary>
    public bool StatesAccuracy(string instrument) => _byName[instrument].Any(p => !p.Accuracy.IsEmpty);

    /// <summary>Every registered instrument's name, in order.</summary>
    public IEnumerable<string> Instruments => _byName.Select(g => g.Key).Order(StringComparer.Ordinal);

    /// <summary>
    /// The state of <paramref name="instrument"/> on <paramref name="date"/>: the period that covers it, else the latest
    /// that ended before it (lapsed), else the first that starts after it; with the days until or since its due date.
    /// </summary>
    public InstrumentState StateOn(string instrument, DateOnly date)
    {
        var periods = _byName[instrument].OrderBy(p => p.CalibratedOn).ToList();
        if (periods.Count == 0)
        {
            return new InstrumentState(instrument, null, CalibrationState.Unregistered, 0);
        }

        if (PeriodOn(instrument, date) is { } current)
        {
            return new InstrumentState(instrument, current, CalibrationState.InCalibration, current.CalibrationDue.DayNumber - date.DayNumber);
        }

        var lapsed = periods.Where(p => p.CalibrationDue < date).MaxBy(p => p.CalibrationDue);
        return lapsed is not null
            ? new InstrumentState(instrument, lapsed, CalibrationState.Lapsed, date.DayNumber - lapsed.CalibrationDue.DayNumber)
            : new InstrumentState(instrument, periods[0], CalibrationState.NotYetCalibrated, periods[0].CalibratedOn.DayNumber - date.DayNumber);
    }

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

/// <summary>Where an instrument stands on a date.</summary>
public enum CalibrationState
{
    /// <summary>A calibration period covers the date.</summary>
    InCalibration,

    /// <summary>Its latest period ended before the date.</summary>
    Lapsed,

    /// <summary>Its first period starts after the date.</summary>
    NotYetCalibrated,

    /// <summary>Not in the register.</summary>
    Unregistered,
}

/// <summary>An instrument's state on a date.</summary>
/// <param name="Instrument">Its name.</param>
/// <param name="Period">The period the state rests on (covering, lapsed or first), or null when unregistered.</param>
/// <param name="State">In calibration, lapsed, not yet calibrated, or unregistered.</param>
/// <param name="Days">Days until the due date when in calibration; since it when lapsed; until the first calibration when not yet calibrated.</param>
public sealed record InstrumentState(string Instrument, InstrumentCalibration? Period, CalibrationState State, int Days);
