namespace TripTestLog.Domain.Codes;

/// <summary>How urgently a finding asks for action; its text code is in <see cref="TextCodes.Severity"/>.</summary>
public enum Severity
{
    /// <summary>Look into it: the result may be sound, but something about it cannot be trusted as it stands.</summary>
    Investigate,

    /// <summary>Act on it: the device failed a requirement.</summary>
    Act,
}
