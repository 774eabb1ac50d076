namespace TripTestLog.Domain.Settings;

/// <summary>
/// The protection settings of a device, one subtype per family. Settings change over a device's life; a register
/// revision carries the settings with the date they took effect.
/// </summary>
public abstract record DeviceSettings
{
    /// <summary>A short human summary, e.g. "curve C" or "Ir 400 A, tr 10 s at 6 Ir".</summary>
    public abstract string Summary { get; }
}
