namespace TripTestLog.Domain.Codes;

/// <summary>How urgently a finding asks for action, in rising order; its text code is in <see cref="TextCodes.Severity"/>.</summary>
public enum Severity
{
    /// <summary>Look into it: the result may be sound, but something about it cannot be trusted as it stands.</summary>
    Investigate,

    /// <summary>Plan work: nothing has failed yet, but a trend or a change will need attention before long.</summary>
    Plan,

    /// <summary>Act on it: the device failed a requirement or is over a limit.</summary>
    Act,

    /// <summary>Take it out of service until repaired: it may not protect its circuit (a trip too late, failed insulation).</summary>
    OutOfService,
}
