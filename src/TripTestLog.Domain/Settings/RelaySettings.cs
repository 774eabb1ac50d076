using System.Globalization;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Domain.Settings;

/// <summary>The settings of an inverse-time overcurrent relay that trips the breaker, tested by primary injection.</summary>
/// <param name="Curve">The IDMT characteristic.</param>
/// <param name="Pickup">Start (pickup) current referred to the primary.</param>
/// <param name="Tms">Time multiplier setting (IEC) or time dial (IEEE).</param>
/// <param name="HighSet">Definite-time high-set pickup, when used.</param>
/// <param name="HighSetDelay">Its delay.</param>
/// <param name="TimeTolerance">Operate-time tolerance (IEC 60255-151 form: percentage with a floor).</param>
/// <param name="PickupTolerance">Relative tolerance on the start current, e.g. 0.05.</param>
/// <param name="OpeningTime">The breaker's opening time, added to the latest allowed time when the trip is timed at the main contacts.</param>
public sealed record RelaySettings(
    IdmtCurve Curve,
    Amperes Pickup,
    double Tms,
    Amperes? HighSet,
    Seconds? HighSetDelay,
    TimeTolerance TimeTolerance,
    double PickupTolerance,
    Seconds OpeningTime) : DeviceSettings
{
    /// <inheritdoc />
    public override string Summary =>
        $"{CurveCodes.Of(Curve)}, pickup {Pickup}, TMS {Tms.ToString("0.###", CultureInfo.InvariantCulture)}"
        + (HighSet is { } hs && HighSetDelay is { } d ? $", high-set {hs} after {d}" : "");
}
