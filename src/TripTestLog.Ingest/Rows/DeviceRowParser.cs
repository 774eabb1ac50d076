using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Ingest.Rows;

/// <summary>Turns a device register row into a <see cref="Device"/> with the settings its family needs, or into problems.</summary>
internal static class DeviceRowParser
{
    public static Device? Parse(RowFields f)
    {
        var tag = f.Tag();
        var site = f.RequiredText("site", "the site");
        var location = f.RequiredText("location", "the location");
        var family = Family(f);
        var rated = f.Number("rated_current", true, 0.1, PlausibleRange.MaxCurrentA, "A");
        var poles = Poles(f);
        var voltage = f.Number("rated_voltage", true, 1, PlausibleRange.MaxVoltageV, "V");
        var commissioned = f.Date("commissioned_on");
        var limit = f.Number("contact_limit", false, 0.01, PlausibleRange.MaxContactUohm, "µΩ");
        var settings = family is { } fam && rated is { } r ? SettingsParser.Parse(f, fam, Amperes.Of(r)) : null;
        var settingsFrom = f.Date("settings_from");
        var referenceAmbient = f.Number("reference_ambient", false, -60, 150, "C", allowZero: true);
        var criticality = Criticality(f);

        if (!f.Ok || tag is null || site is null || location is null || family is null || settings is null
            || rated is null || poles is null || voltage is null)
        {
            return null;
        }

        return new Device(
            tag.Value, site, location, family.Value, Amperes.Of(rated.Value), poles.Value, Volts.Of(voltage.Value),
            commissioned, limit is { } l ? MicroOhms.Of(l) : null, f.Text("make"), f.Text("model"), f.Text("serial"), settings)
        {
            SettingsFrom = settingsFrom,
            CurveTable = family == DeviceFamily.CurveTable ? null : f.OptionalText("curve_table"),
            ReferenceAmbient = referenceAmbient is { } ra ? Celsius.Of(ra) : null,
            AmbientTable = f.OptionalText("ambient_table"),
            Criticality = criticality,
        };
    }

    private static int Criticality(RowFields f)
    {
        var text = f.OptionalText("criticality");
        if (text is null)
        {
            return Device.DefaultCriticality;
        }

        if (!int.TryParse(text, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var value)
            || value is < Device.HighestCriticality or > Device.LowestCriticality)
        {
            f.Fail("criticality", $"'{text}' is not a criticality; write 1 (highest), 2 or 3 (lowest), or leave it empty for 2");
            return Device.DefaultCriticality;
        }

        return value;
    }

    private static DeviceFamily? Family(RowFields f)
    {
        var text = f.RequiredText("family", "the device family");
        if (text is null)
        {
            return null;
        }

        if (FamilyCodes.TryParse(text, out var family))
        {
            return family;
        }

        f.Fail("family", $"'{text}' is not a known device family; write one of {string.Join(", ", FamilyCodes.All)}");
        return null;
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
