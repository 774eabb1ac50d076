using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Verdicts;

/// <summary>The lab's decision rule, the guard band and the accuracy assumed where the instrument register states none.</summary>
/// <param name="Rule">Simple, guarded or non-binary.</param>
/// <param name="Defaults">The accuracy figures used where the register has none.</param>
/// <param name="GuardBandFactor">The guard band w as a multiple of the expanded uncertainty U (default 1: w = U).</param>
public sealed record DecisionPolicy(DecisionRule Rule, InstrumentAccuracy Defaults, double GuardBandFactor = 1.0)
{
    /// <summary>Simple acceptance with the shipped default accuracy: no verdict changes.</summary>
    public static DecisionPolicy Default { get; } = new(DecisionRule.Simple, LabPolicy.DefaultAccuracy);

    /// <summary>The accuracy of a measurement made with <paramref name="instrument"/> on <paramref name="date"/>: the register's
    /// calibration period in force, with the defaults where it states nothing.</summary>
    public ResolvedAccuracy AccuracyOf(InstrumentRegister register, string instrument, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(register);
        return (instrument.Length > 0 ? register.AccuracyOn(instrument, date) : InstrumentAccuracy.None).Over(Defaults);
    }
}
