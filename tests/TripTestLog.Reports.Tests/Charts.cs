using TripTestLog.Application.Check;
using TripTestLog.Domain.Assessment;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Reports.Tests;

/// <summary>Real judged tests of an invented C16 miniature breaker, for the chart tests.</summary>
internal static class Charts
{
    public static readonly DeviceHistory C16 = new([new Device(AssetTag.Of("C-16"), "Site", "Way 1", DeviceFamily.Iec60898, Amperes.Of(16), 1,
        Volts.Of(230), null, MicroOhms.Of(8000), "", "", "", new Iec60898Settings(TripCurve.C))]);

    public static ITripEnvelope Envelope => EnvelopeFactory.For(C16.Latest, C16.Latest.Settings, 1.0, new Dictionary<string, CurveTable>());

    /// <summary>The text of every &lt;text&gt; element of an SVG, trimmed.</summary>
    public static IReadOnlyList<string> SvgText(string svg) =>
        [.. System.Text.RegularExpressions.Regex.Matches(svg, "<text[^>]*>([^<]*)</text>").Select(m => m.Groups[1].Value.Trim())];

    /// <summary>A cold all-poles trip of the C16 at <paramref name="amps"/> after <paramref name="seconds"/>, judged for real.</summary>
    public static JudgedTrip Trip(double amps, double seconds, int year = 2024, int line = 2, StartCondition start = StartCondition.Cold)
    {
        var measurement = new TripMeasurement(AssetTag.Of("C-16"), TestedAt.At(new DateTime(year, 3, 1, 12, 0, 0)), TestStage.AsFound, Pole.All,
            Amperes.Of(amps), TripOutcome.TrippedAfter(Seconds.Of(seconds)), start, Celsius.Of(30), "", "", "");
        var result = new TripAssessor(new Dictionary<string, CurveTable>(), new Dictionary<string, AmbientTable>()).Assess(C16, measurement);
        return new JudgedTrip(new StoredTrip(measurement.Tag, measurement, "trips.csv", line), result.Device, result.Envelope, result.Assessment, []);
    }
}
