namespace TripTestLog.Domain.Verdicts;

/// <summary>A non-binary statement of conformity (ILAC-G8:09/2019); its text code is in <see cref="Codes.TextCodes.Conformity"/>.</summary>
public enum Conformity
{
    /// <summary>Inside the limits by more than the guard band.</summary>
    Pass,

    /// <summary>Inside the limits, but by less than the guard band.</summary>
    ConditionalPass,

    /// <summary>Outside the limits, but by less than the guard band.</summary>
    ConditionalFail,

    /// <summary>Outside the limits by more than the guard band.</summary>
    Fail,
}
