using TripTestLog.Application.Records;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Ingest.Rows;

/// <summary>Turns a contact resistance row into a <see cref="ContactMeasurement"/>, or into problems.</summary>
internal static class ContactRowParser
{
    public static ContactMeasurement? Parse(RowFields f)
    {
        var tag = f.Tag();
        var when = f.When("tested_at");
        var stage = f.Stage();
        var pole = f.Pole();
        var resistance = f.Number("resistance", true, 0.001, PlausibleRange.MaxContactUohm, "µΩ");
        var current = f.Number("test_current", true, 0.001, 10_000, "A");
        var temperature = f.Number("temperature", false, -60, 150, "C", allowZero: true);

        if (!f.Ok || tag is null || when is null || stage is null || pole is null || resistance is null || current is null)
        {
            return null;
        }

        return new ContactMeasurement(
            tag.Value, when.Value, stage.Value, pole.Value, MicroOhms.Of(resistance.Value), Amperes.Of(current.Value),
            temperature is { } t ? Celsius.Of(t) : null, f.Text("instrument"), f.Text("technician"));
    }
}
