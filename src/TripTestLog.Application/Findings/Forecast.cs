using System.Globalization;

namespace TripTestLog.Application.Findings;

/// <summary>
/// The words of a forecast finding, made once its device's one due date is known. A forecast date already before the
/// day judged on says the device has probably crossed the edge or limit since then, and brings its test forward to that
/// day; otherwise it is set against the due date.
/// </summary>
internal static class Forecast
{
    /// <summary>
    /// "<paramref name="stem"/> and reach it about DATE, before the next test is due (DUE); ACTION", or, for a date before
    /// <paramref name="asOf"/>, "<paramref name="stem"/> and have probably <paramref name="crossed"/> since about DATE: test it now".
    /// </summary>
    public static string Text(string stem, string crossed, DateOnly on, DateOnly due, DateOnly asOf, string action)
    {
        if (on < asOf)
        {
            return Invariant($"{stem} and have probably {crossed} since about {on:yyyy-MM-dd} (judged on {asOf:yyyy-MM-dd}): test it now");
        }

        return on <= due
            ? Invariant($"{stem} and reach it about {on:yyyy-MM-dd}, before the next test is due ({due:yyyy-MM-dd}); {action}")
            : Invariant($"{stem} and reach it about {on:yyyy-MM-dd}, after the next test is due ({due:yyyy-MM-dd}): confirm the trend then");
    }

    /// <summary>Whether an open forecast of <paramref name="findings"/> falls before <paramref name="asOf"/>.</summary>
    public static bool AnyPast(IEnumerable<Finding> findings, DateOnly asOf) =>
        findings.Any(f => f.Open && f.ForecastOn is { } on && on < asOf);

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
