using TripTestLog.Application.Records;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Ingest.Rows;

/// <summary>Turns an insulation resistance row into an <see cref="InsulationMeasurement"/>, or into problems.</summary>
internal static class InsulationRowParser
{
    public static InsulationMeasurement? Parse(RowFields f)
    {
        var tag = f.Tag();
        var when = f.When("tested_at");
        var stage = f.Stage();
        var path = Path(f);
        var voltage = f.Number("test_voltage", true, 1, PlausibleRange.MaxVoltageV, "V");
        var reading = Reading(f);
        var temperature = f.Number("temperature", false, -60, 150, "C", allowZero: true);
        var duration = f.Number("duration", false, 0.1, PlausibleRange.MaxTimeS, "s");

        if (!f.Ok || tag is null || when is null || stage is null || path is null || voltage is null || reading is null)
        {
            return null;
        }

        return new InsulationMeasurement(
            tag.Value, when.Value, stage.Value, path, Volts.Of(voltage.Value), reading.Value,
            temperature is { } t ? Celsius.Of(t) : null, duration is { } d ? Seconds.Of(d) : null)
        {
            Instrument = f.Text("instrument"),
        };
    }

    private static string? Path(RowFields f)
    {
        var text = f.RequiredText("path", "the measured path (e.g. 1-E, 1-2, 1-1')");
        if (text is null)
        {
            return null;
        }

        // Pole or earth terminals joined by '-': 1-E, 1-2, N-E; a trailing ' marks the load side across open contacts.
        var parts = text.Split('-');
        if (parts.Length != 2 || !parts.All(p => p.TrimEnd('\'') is "1" or "2" or "3" or "4" or "N" or "E"))
        {
            f.Fail("path", $"'{text}' is not a path; write two terminals joined by '-': 1-4, N or E, with ' for the load side (e.g. 1-E, 1-2, 1-1')");
            return null;
        }

        return text;
    }

    private static InsulationReading? Reading(RowFields f)
    {
        var text = f.Text("resistance");
        var over = text.StartsWith('>');
        if (!over)
        {
            var plain = f.Number("resistance", true, 0.000001, PlausibleRange.MaxInsulationMohm, "MΩ");
            return plain is { } p ? new InsulationReading(MegaOhms.Of(p), false) : null;
        }

        // A leading '>' means the instrument's range was exceeded; parse the limit with the same rules as a plain value.
        var limit = f.NumberFrom(text[1..].Trim(), "resistance", 0.000001, PlausibleRange.MaxInsulationMohm);
        return limit is { } l ? new InsulationReading(MegaOhms.Of(l), true) : null;
    }
}
