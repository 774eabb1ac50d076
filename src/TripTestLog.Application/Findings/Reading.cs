namespace TripTestLog.Application.Findings;

/// <summary>A finding's value or limit with its unit, so output can name the unit in the field.</summary>
/// <param name="Amount">The number.</param>
/// <param name="Unit">Its unit.</param>
public readonly record struct Reading(double Amount, ReadingUnit Unit);

/// <summary>The units a finding's value or limit can carry; each has a fixed field suffix in the output.</summary>
public enum ReadingUnit
{
    /// <summary>Seconds (suffix s).</summary>
    Seconds,

    /// <summary>Micro-ohms (suffix uohm).</summary>
    MicroOhms,

    /// <summary>Megohms (suffix mohm).</summary>
    MegaOhms,

    /// <summary>Amperes (suffix a).</summary>
    Amperes,

    /// <summary>Per cent (suffix percent).</summary>
    Percent,

    /// <summary>A modified z-score, no unit (suffix z).</summary>
    Score,

    /// <summary>Days (suffix days).</summary>
    Days,

    /// <summary>Volts (suffix v).</summary>
    Volts,
}
