using TripTestLog.Application.Findings;

namespace TripTestLog.Wording;

/// <summary>The words of the contact resistance rules' findings.</summary>
public static partial class FindingWords
{
    /// <summary>
    /// The ANSI/NETA maintenance testing specifications' customary guide for pole spread: investigate a pole more than
    /// this many per cent above the lowest (from memory; a guide, not a failure criterion).
    /// </summary>
    public const double CustomarySpreadPercent = 50;

    // The threshold stated is always the policy's; the basis says whose it is.
    private static string SpreadBasis(ContactFacts.PoleSpread f) => f.Basis == Application.Findings.SpreadBasis.CustomaryGuide
        ? Invariant($"ANSI/NETA maintenance testing specifications: investigate a pole more than {f.ThresholdPercent:0.###} % above the lowest (a customary guide, not a failure)")
        : Invariant($"lab policy: investigate a pole more than {f.ThresholdPercent:0.###} % above the lowest (the ANSI/NETA maintenance testing specifications' customary guide is {CustomarySpreadPercent:0.###} %; not a failure)");

    private static string ContactWithinUncertainty(ContactFacts.WithinUncertainty f) =>
        Invariant($"pole {f.Pole} reads {f.Corrected:0.#} µΩ against the limit of {f.Limit:0} µΩ, within the guard band of {f.Guard:0.##} µΩ (U = {f.Expanded:0.##} µΩ; {f.Accuracy.Words(false, false, true, false)}): retest with a more accurate instrument");

    private static string OverLimit(ContactFacts.OverLimit f) =>
        Invariant($"pole {f.Pole} reads {Describe(f.Reading)}, over the limit of {f.Limit:0} µΩ; clean and re-torque the terminations or replace the breaker");

    private static string PoleSpread(ContactFacts.PoleSpread f) =>
        Invariant($"pole {f.Pole} reads {f.AbovePercent:0}% above the device's lowest pole ({f.Corrected:0} against {f.Lowest:0} µΩ at 20 °C); investigate the connections and contacts of that pole (pole resistance alone does not predict performance)");

    private static string Rise(ContactFacts.Rise f) =>
        Invariant($"pole {f.Pole} has risen {f.RisePercent:0}% since {f.Since:yyyy-MM-dd} ({f.From:0} to {f.To:0} µΩ at 20 °C); plan cleaning and re-torquing");

    private static string LowTestCurrent(ContactFacts.LowTestCurrent f) =>
        Invariant($"contact resistance measured at {f.Amperes:0.#} A DC, below the {f.Usual:0} A usual for a {f.Rated:0} A breaker; a low current can miss a film or a loose joint: repeat at the usual current");

    private static string TrendLimit(ContactFacts.TrendLimit f) =>
        Forecast(Invariant($"pole {f.Pole}'s readings rise {f.SlopePerYear:0} µΩ a year towards the limit of {f.Limit:0} µΩ"), "passed it", f.Dates,
            f.Scattered ? "the readings scatter too much for the date to be trusted: retest sooner" : "plan cleaning and re-torquing before then")
        + Untraceable(f.Untraceable);

    private static string Describe(ContactFacts.PoleReading r) => r.TemperatureKnown
        ? Invariant($"{r.Corrected:0} µΩ at 20 °C ({r.Measured:0} µΩ as measured)")
        : Invariant($"{r.Measured:0} µΩ (no temperature recorded: not corrected)");
}
