using TripTestLog.Domain.Codes;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Ingest.Rows;

/// <summary>Turns a trip test row into a <see cref="TripMeasurement"/>, or into problems.</summary>
internal static class TripRowParser
{
    public static TripMeasurement? Parse(RowFields f)
    {
        var tag = f.Tag();
        var when = f.When("tested_at");
        var stage = f.Stage();
        var pole = f.Pole();
        var current = f.Number("current", true, 0.001, PlausibleRange.MaxCurrentA, "A");
        var outcome = Outcome(f);
        var start = Start(f);
        var ambient = f.Number("ambient", false, -60, 150, "C", allowZero: true);
        var found = Found(f);

        if (!f.Ok || tag is null || when is null || stage is null || pole is null || current is null || outcome is null || start is null)
        {
            return null;
        }

        return new TripMeasurement(
            tag.Value, when.Value, stage.Value, pole.Value, Amperes.Of(current.Value), outcome.Value, start.Value,
            ambient is { } a ? Celsius.Of(a) : null, f.Text("instrument"), f.Text("technician"), f.Text("note"))
        {
            FoundSettings = found.IsEmpty ? null : found,
        };
    }

    // Settings read off the device at the test; they win over the register for this test.
    private static SettingsFound Found(RowFields f)
    {
        Amperes? Current(string column) =>
            f.Number(column, false, 0.1, PlausibleRange.MaxCurrentA, "A") is { } v ? Amperes.Of(v) : null;

        return new SettingsFound(Current("ir"), Current("isd"), Current("ii"), Current("im"), Current("pickup"),
            f.Number("tms", false, 0.01, 15, "(multiplier)"));
    }

    private static TripOutcome? Outcome(RowFields f)
    {
        var trip = f.Number("trip_time", false, PlausibleRange.MinTripTimeS, PlausibleRange.MaxTimeS, "s");
        var held = f.Number("held", false, PlausibleRange.MinTripTimeS, PlausibleRange.MaxTimeS, "s");
        var tripText = f.Text("trip_time");
        var heldText = f.Text("held");
        if (tripText.Length > 0 && heldText.Length > 0)
        {
            f.Fail("held", "give held only when the breaker did not trip; this row also has a trip time");
            return null;
        }

        if (tripText.Length == 0 && heldText.Length == 0)
        {
            f.Fail(f.Header("held") == "held" ? "trip_time" : "held",
                "no trip time and no hold time: write the trip time, or, when it did not trip, how long the current was held");
            return null;
        }

        return trip is { } t ? TripOutcome.TrippedAfter(Seconds.Of(t))
            : held is { } h ? TripOutcome.HeldFor(Seconds.Of(h))
            : null;
    }

    private static StartCondition? Start(RowFields f)
    {
        var text = f.RequiredText("start", "the start condition");
        if (text is null)
        {
            return null;
        }

        if (TextCodes.Start.TryParse(text, out var start))
        {
            return start;
        }

        f.Fail("start", $"'{text}' is not a start condition; write {TextCodes.Start.Choices}");
        return null;
    }
}
