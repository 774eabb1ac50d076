using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;

namespace TripTestLog.Wording;

/// <summary>The words of the trip rules' findings.</summary>
public static partial class FindingWords
{
    private static string TripWithinUncertainty(TripFacts.WithinUncertainty f)
    {
        var statement = f.Conformity is { } c ? $" ({TextCodes.Conformity.Of(c)})" : "";
        return $"{TextCodes.Stage.Of(f.Stage)} at {f.Point} is within the measurement uncertainty of its limit{statement}: {f.Reason}; "
            + "retest with a more accurate instrument";
    }

    // Whichever test fired is printed: the factor between the two times, or the move of the place in the band.
    private static string Drift(TripFacts.Drift f)
    {
        var compared = f.ByTime
            ? Invariant($"{(f.Slower ? "slower" : "faster")} by a factor of {f.Factor:0.00} (the policy's limit: {1 + f.TimeLimitPercent / 100:0.00} either way on a log scale)")
            : Invariant($"its place in the band moved {f.Shift * 100:+0;-0} % of the band, from {f.FromPlace * 100:0} % to {f.ToPlace * 100:0} % (0 % = earliest allowed, 100 % = latest; the policy's limit: {f.BandLimitPercent:0} %)");
        var restarted = f.SettingsChangedOn is { } changed ? Invariant($" (since the settings changed on {changed:yyyy-MM-dd})") : "";
        return Invariant($"as-found trip time at {f.Point} moved from {f.First} ({f.FirstOn:yyyy-MM-dd}) to {f.Last} ({f.LastOn:yyyy-MM-dd}){restarted}: {compared}; look for wear or dirt before it leaves the band");
    }

    private static string TrendExit(TripFacts.TrendExit f)
    {
        var side = f.TowardsLatest ? "latest allowed time" : "earliest allowed time";
        var stem = Invariant($"as-found trip times at {f.Point} trend towards the {side} ({f.Edge})");
        return Forecast(stem, "left the band", f.Dates,
                f.Scattered ? "the tests scatter too much for the date to be trusted: retest sooner" : "plan a service or replacement before then")
            + Untraceable(f.Untraceable);
    }

    private static string PeerOutlier(TripFacts.PeerOutlier f) =>
        Invariant($"at {f.Point} it trips {(f.Slower ? "slower" : "faster")} than its {f.Peers} peers ({f.Group}): {f.Place * 100:0}% of the way through the band against their median of {f.Median * 100:0}%; it passes, but check the release and the test");
}
