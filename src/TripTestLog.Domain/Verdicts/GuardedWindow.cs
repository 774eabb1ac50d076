using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Verdicts;

/// <summary>
/// The window a trip time must fall in to pass under the guarded rule (ILAC-G8:09/2019): each closed limit of the plain
/// window moved inward by its guard band w.
/// </summary>
/// <param name="Minimum">The guarded minimum (the plain minimum plus w), or null where the window has no closed minimum.</param>
/// <param name="Maximum">The guarded maximum (the plain maximum less w), or null where the window has no maximum.</param>
/// <param name="MinimumBand">The guard band w at the minimum, s.</param>
/// <param name="MaximumBand">The guard band w at the maximum, s.</param>
public sealed record GuardedWindow(Seconds? Minimum, Seconds? Maximum, double? MinimumBand, double? MaximumBand)
{
    /// <summary>True when the guard bands meet or cross: no trip time proves a pass with this accuracy.</summary>
    public bool Closed => Minimum is { } n && Maximum is { } x && n.Value >= x.Value;
}
