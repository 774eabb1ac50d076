using System.Globalization;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Application.Findings;

/// <summary>
/// A trip test point of one device, so tests made at it over the years can be compared: the nominal multiple (the
/// standard's point nearest the test's current, within 10 %, else the measured multiple on a 5 % grid), the start, and
/// the pole when one pole was loaded.
/// </summary>
/// <param name="Key">Identity for grouping.</param>
/// <param name="Label">In words, e.g. "2.55 In cold" or "5 In cold, pole 2".</param>
public readonly record struct TripPoint(string Key, string Label)
{
    // Aimed at a standard's point when within 10 % of its multiple (test sets land a few per cent off the set point).
    private const double PointWindow = 0.10;
    private const double Grid = 1.05;

    /// <summary>
    /// The tests that can be compared over the years, by point, in time order: tripped, assessable as-found tests (held
    /// and as-left tests show no drift). Drift, trends, peers and the report's drift charts all read this one grouping.
    /// </summary>
    public static IReadOnlyList<(TripPoint Point, List<JudgedTrip> Tests)> Series(IReadOnlyList<JudgedTrip> trips)
    {
        ArgumentNullException.ThrowIfNull(trips);
        return [.. trips.Where(t => t.Trip.Measurement.Stage == TestStage.AsFound && t.Trip.Measurement.Outcome.Tripped
                && t.Assessment.Verdict != Domain.Verdicts.Verdict.NotAssessable)
            .GroupBy(Of)
            .Select(g => (g.Key, g.ToList()))];
    }

    /// <summary>The point <paramref name="judged"/> was made at.</summary>
    public static TripPoint Of(JudgedTrip judged)
    {
        ArgumentNullException.ThrowIfNull(judged);
        return Of(judged.Trip.Measurement, judged.Envelope, judged.Device.Poles);
    }

    /// <summary>
    /// The point a test at <paramref name="m"/> on a device of <paramref name="poles"/> poles was made at, against
    /// <paramref name="envelope"/>: needs no verdict, so the peer pass can group tests before judging any.
    /// </summary>
    public static TripPoint Of(TripMeasurement m, ITripEnvelope envelope, int poles)
    {
        ArgumentNullException.ThrowIfNull(m);
        ArgumentNullException.ThrowIfNull(envelope);
        var multiple = m.Current.Value / envelope.Reference.Value;
        double? aimed = null;
        var nearest = PointWindow;
        foreach (var point in envelope.Points)
        {
            var off = Math.Abs(multiple / point.Multiple.Value - 1);
            if (aimed is null ? off <= nearest : off < nearest)
            {
                (aimed, nearest) = (point.Multiple.Value, off);
            }
        }

        var nominal = aimed ?? Math.Round(Math.Pow(Grid, Math.Round(Math.Log(multiple) / Math.Log(Grid))), 2);
        var start = TextCodes.Start.Of(m.Start);
        var pole = TestConditions.Of(m, poles).Loading == PoleLoading.OnePole ? $", pole {m.Pole}" : "";
        var text = nominal.ToString("0.##", CultureInfo.InvariantCulture);
        return new TripPoint($"{text}|{start}|{pole}", $"{text} {envelope.ReferenceName} {start}{pole}");
    }
}
