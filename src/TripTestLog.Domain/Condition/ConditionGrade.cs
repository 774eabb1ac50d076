namespace TripTestLog.Domain.Condition;

/// <summary>A device's condition from its open findings, best first; its text code is in <see cref="Codes.TextCodes.Grade"/>.</summary>
public enum ConditionGrade
{
    /// <summary>No open finding.</summary>
    Sound,

    /// <summary>Open findings that ask only for a look: keep an eye on it.</summary>
    Watch,

    /// <summary>A trend or change that will need work before long: plan it.</summary>
    PlanWork,

    /// <summary>
    /// No as-found test of any kind on record: its condition is unknown, so it ranks above anything known to work and
    /// below anything known to have failed.
    /// </summary>
    Untested,

    /// <summary>Over a limit or out of its band: repair it.</summary>
    Repair,

    /// <summary>May not protect its circuit: take it out of service until repaired and retested.</summary>
    TakeOutOfService,
}
