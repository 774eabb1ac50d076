namespace TripTestLog.Application.Findings;

/// <summary>
/// Forecast findings against the day judged on: a forecast date already before it says the device has probably crossed
/// the edge or limit since then, and brings its test forward to that day. Their words are made at the edge.
/// </summary>
internal static class Forecast
{
    /// <summary>Whether an open forecast of <paramref name="findings"/> falls before <paramref name="asOf"/>.</summary>
    public static bool AnyPast(IEnumerable<Finding> findings, DateOnly asOf) =>
        findings.Any(f => f.Open && f.ForecastOn is { } on && on < asOf);
}
