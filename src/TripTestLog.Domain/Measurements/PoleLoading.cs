namespace TripTestLog.Domain.Measurements;

/// <summary>Which poles of a breaker carried the test current.</summary>
public enum PoleLoading
{
    /// <summary>Every protected pole carried the current (or the breaker has one pole).</summary>
    AllPoles,

    /// <summary>One pole of a multipole breaker carried the current alone.</summary>
    OnePole,
}
