using System.Globalization;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Assessment;

/// <summary>
/// Checks a test's cold or warm claim against the test before it on the same device. Warm means straight after a
/// completed hold at the conventional non-tripping point (IEC 60898-1 row b follows row a; IEC 60947-2's 1.30 Ir test
/// follows its 1.05 Ir test); cold means rested since any test that carried current long enough to warm the release.
/// The gaps are lab policy (<see cref="LabPolicy.WarmGap"/>, <see cref="LabPolicy.ColdRest"/>). A doubtful claim is
/// only a doubt: the assessor then judges the test both ways and keeps the verdict when both agree.
/// </summary>
public static class StartCheck
{
    /// <summary>Why <paramref name="test"/>'s start claim is doubtful given <paramref name="previous"/> (the device's test before it), or null.</summary>
    public static string? Doubt(TripMeasurement test, TripMeasurement? previous, ITripEnvelope envelope)
    {
        ArgumentNullException.ThrowIfNull(test);
        ArgumentNullException.ThrowIfNull(envelope);
        if (previous is not null && previous.Tag != test.Tag)
        {
            previous = null;
        }

        return test.Start == StartCondition.Warm ? WarmDoubt(test, previous, envelope) : ColdDoubt(test, previous);
    }

    private static string? WarmDoubt(TripMeasurement test, TripMeasurement? previous, ITripEnvelope envelope)
    {
        // The conventional non-tripping point: row a or 1.05 Ir. A family without one (relays, curve tables) has no warm rule.
        var point = envelope.Points.FirstOrDefault(p => p.IsNoTripPoint && p.Start == StartCondition.Cold && !p.AnyStart);
        if (point is null)
        {
            return null;
        }

        var needed = $"a completed {point.Multiple.Value:0.##} {envelope.ReferenceName} hold of {point.MustHoldFor} just before it";
        if (previous is null)
        {
            return $"it is marked warm, but no test of this device comes before it; row {point.Label} needs {needed}";
        }

        var multiple = previous.Current.Value / envelope.Reference.Value;
        var completedHold = !previous.Outcome.Tripped
            && previous.Outcome.Time >= point.MustHoldFor!.Value
            && multiple >= point.Multiple.Value * (1 - Settings.LabPolicy.PointWindow);
        if (!completedHold)
        {
            return $"it is marked warm, but the test before it ({Describe(previous, envelope)}) is not {needed}";
        }

        if (test.TestedAt.HasTime && previous.TestedAt.HasTime)
        {
            var gap = test.TestedAt.Local - End(previous);
            if (gap > LabPolicy.WarmGap || gap < -TimeSpan.FromMinutes(1))
            {
                return $"it is marked warm, but it started {Minutes(gap)} after the hold at {previous.TestedAt} ended (lab policy: within {Minutes(LabPolicy.WarmGap)})";
            }
        }
        else if (test.TestedAt.Date != previous.TestedAt.Date)
        {
            return $"it is marked warm, but the hold before it was on {previous.TestedAt.Date:yyyy-MM-dd}";
        }

        return null;
    }

    private static string? ColdDoubt(TripMeasurement test, TripMeasurement? previous)
    {
        if (previous is null || !test.TestedAt.HasTime || !previous.TestedAt.HasTime
            || previous.Outcome.Time.Value < LabPolicy.HeatingTestSeconds)
        {
            return null;
        }

        var rest = test.TestedAt.Local - End(previous);
        return rest < LabPolicy.ColdRest
            ? $"it is marked cold, but it started {Minutes(rest)} after a {previous.Outcome.Time} test at {previous.TestedAt} ended (lab policy: rest {Minutes(LabPolicy.ColdRest)} before a cold start)"
            : null;
    }

    private static DateTime End(TripMeasurement m) => m.TestedAt.Local + TimeSpan.FromSeconds(m.Outcome.Time.Value);

    private static string Describe(TripMeasurement m, ITripEnvelope envelope) =>
        $"{m.TestedAt}, {(m.Current.Value / envelope.Reference.Value).ToString("0.###", CultureInfo.InvariantCulture)} {envelope.ReferenceName}, {m.Outcome}";

    private static string Minutes(TimeSpan span) => $"{span.TotalMinutes.ToString("0", CultureInfo.InvariantCulture)} min";
}
