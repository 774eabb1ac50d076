using TripTestLog.Application.Findings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Wording;

/// <summary>The words for what a later test showed that settled a finding.</summary>
public static partial class FindingWords
{
    private static string What(Settler by) => by switch
    {
        Settler.TripVerdict v => $"{VerdictWords(v.Verdict)} at {v.Point}" + (v.ClearOfUncertainty ? " clear of the measurement uncertainty" : ""),
        Settler.RegisterSettings => "test that read the register's settings",
        Settler.TraceableInstrument t => t.Tests switch
        {
            TestKind.Trip => "trip test with a traceable instrument",
            TestKind.Contact => "contact test with a traceable instrument",
            _ => "insulation test with a traceable instrument",
        },
        Settler.PoleWithinLimit p => Invariant($"reading of pole {p.Pole} within the limit ({p.MicroOhms:0} µΩ)"),
        Settler.PoleWithinSpread p => $"reading of pole {p.Pole} within the spread",
        Settler.PoleNearBaseline p => $"reading of pole {p.Pole} near its baseline",
        Settler.AdequateTestCurrent => "test at an adequate test current",
        Settler.PathAboveMinimum p => $"reading of path {p.Path} above the minimum",
        Settler.PathAtVoltage p => Invariant($"test of path {p.Path} at {p.Volts:0} V DC"),
        Settler.ReadingClearOfUncertainty => "a reading clear of the measurement uncertainty of its limit",
        _ => throw new InvalidOperationException($"no words for the settler {by.GetType().Name}"),
    };

    private static string VerdictWords(Verdict verdict) => verdict switch
    {
        Verdict.Pass => "pass",
        Verdict.TooEarly => "too early",
        _ => "too late",
    };
}
