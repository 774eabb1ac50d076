using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Check;

/// <summary>
/// Which judged tests a desk user asked to see. Every test is still judged with its whole history (a warm start needs
/// the test before it); the filter only chooses what is written. Null means no condition.
/// </summary>
/// <param name="Site">The site of the register entry in force at the test, compared without regard to case.</param>
/// <param name="From">The first test date shown.</param>
/// <param name="To">The last test date shown.</param>
/// <param name="Verdicts">The verdicts shown.</param>
/// <param name="Stage">The stage shown.</param>
/// <param name="Family">The device family shown.</param>
public sealed record CheckFilter(string? Site = null, DateOnly? From = null, DateOnly? To = null, IReadOnlySet<Verdict>? Verdicts = null,
    TestStage? Stage = null, DeviceFamily? Family = null)
{
    /// <summary>No condition: every test.</summary>
    public static CheckFilter All { get; } = new();

    /// <summary>Whether <paramref name="judged"/> is to be shown.</summary>
    public bool Admits(JudgedTrip judged)
    {
        ArgumentNullException.ThrowIfNull(judged);
        var m = judged.Trip.Measurement;
        var date = m.TestedAt.Date;
        return (Site is null || string.Equals(judged.Device.Site, Site, StringComparison.OrdinalIgnoreCase))
            && (From is not { } from || date >= from)
            && (To is not { } to || date <= to)
            && (Verdicts is null || Verdicts.Contains(judged.Assessment.Verdict))
            && (Stage is not { } stage || m.Stage == stage)
            && (Family is not { } family || judged.Device.Family == family);
    }
}
