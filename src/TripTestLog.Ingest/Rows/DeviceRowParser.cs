using TripTestLog.Domain.Records;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;

namespace TripTestLog.Ingest.Rows;

/// <summary>Turns a device register row into a <see cref="Device"/>, or into problems.</summary>
internal static class DeviceRowParser
{
    public static Device? Parse(RowFields f)
    {
        var tag = f.Tag();
        var site = f.RequiredText("site", "the site");
        var location = f.RequiredText("location", "the location");
        var family = Family(f);
        var curve = family == DeviceFamily.Iec60898 ? Curve(f) : null;
        var rated = f.Number("rated_current", true, 0.1, PlausibleRange.MaxCurrentA, "A");
        var poles = Poles(f);
        var voltage = f.Number("rated_voltage", true, 1, PlausibleRange.MaxVoltageV, "V");
        var commissioned = f.Date("commissioned_on");
        var limit = f.Number("contact_limit", false, 0.01, PlausibleRange.MaxContactUohm, "uOhm");

        if (!f.Ok || tag is null || site is null || location is null || family is null || curve is null
            || rated is null || poles is null || voltage is null)
        {
            return null;
        }

        return new Device(
            tag.Value, site, location, family.Value, curve.Value, Amperes.Of(rated.Value), poles.Value, Volts.Of(voltage.Value),
            commissioned, limit is { } l ? MicroOhms.Of(l) : null, f.Text("make"), f.Text("model"), f.Text("serial"));
    }

    private static DeviceFamily? Family(RowFields f)
    {
        var text = f.RequiredText("family", "the device family");
        switch (text?.ToLowerInvariant())
        {
            case null:
                return null;
            case "iec60898":
                return DeviceFamily.Iec60898;
            default:
                f.Fail("family", $"'{text}' is not a known device family; write iec60898");
                return null;
        }
    }

    private static TripCurve? Curve(RowFields f)
    {
        var text = f.RequiredText("curve", "the trip curve (B, C or D) of an iec60898 device");
        switch (text?.ToUpperInvariant())
        {
            case null:
                return null;
            case "B":
                return TripCurve.B;
            case "C":
                return TripCurve.C;
            case "D":
                return TripCurve.D;
            default:
                f.Fail("curve", $"'{text}' is not an IEC 60898-1 curve; write B, C or D");
                return null;
        }
    }

    private static int? Poles(RowFields f)
    {
        var text = f.RequiredText("poles", "the number of poles");
        if (text is null)
        {
            return null;
        }

        if (!int.TryParse(text, out var poles) || poles is < 1 or > 4)
        {
            f.Fail("poles", $"'{text}' is not a number of poles; write 1, 2, 3 or 4");
            return null;
        }

        return poles;
    }
}
