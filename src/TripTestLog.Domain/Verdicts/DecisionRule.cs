namespace TripTestLog.Domain.Verdicts;

/// <summary>
/// How a verdict takes the measurement uncertainty into account (ILAC-G8:09/2019; ISO/IEC 17025:2017, 7.1.3 and 7.8.6);
/// its text code is in <see cref="Codes.TextCodes.DecisionRule"/>.
/// </summary>
public enum DecisionRule
{
    /// <summary>Simple acceptance: the limit as written, each reading taken as exact.</summary>
    Simple,

    /// <summary>Guarded acceptance and rejection: a pass needs the limit cleared by the guard band, a failure needs it broken by it.</summary>
    Guarded,

    /// <summary>The verdict as under simple acceptance, with a pass, conditional pass, conditional fail or fail statement beside it.</summary>
    NonBinary,
}
