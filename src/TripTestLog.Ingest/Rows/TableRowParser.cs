using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Quantities;
using TripTestLog.Application.Records;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Ingest.Rows;

/// <summary>Turns curve table and ambient table rows into table rows, or into problems.</summary>
internal static class TableRowParser
{
    public static CurveTableRow? Curve(RowFields f)
    {
        var table = f.RequiredText("table", "the table name");
        var multiple = f.Number("multiple", true, 0.01, 10_000, "x reference");
        var min = f.Number("min", false, 0, PlausibleRange.MaxTimeS, "s", allowZero: true);
        var max = f.Number("max", false, 0.0001, PlausibleRange.MaxTimeS, "s");
        if (!f.Has("min"))
        {
            f.Fail("min", "the minimum time is required; write 0 where the device may trip at once");
        }

        if (!f.Ok || table is null || multiple is null || min is null)
        {
            return null;
        }

        return new CurveTableRow(table, new CurveTablePoint(CurrentMultiple.Of(multiple.Value), Seconds.Of(min.Value), max is { } m ? Seconds.Of(m) : null));
    }

    public static InstrumentCalibration? Instrument(RowFields f)
    {
        var name = f.RequiredText("instrument", "the instrument name");
        var kind = f.RequiredText("kind", "the kind of instrument");
        var serial = f.RequiredText("serial", "the serial number");
        var on = f.Has("calibrated_on") ? f.Date("calibrated_on") : Missing(f, "calibrated_on");
        var due = f.Has("calibration_due") ? f.Date("calibration_due", allowFuture: true) : Missing(f, "calibration_due");
        if (on is { } a && due is { } b && b < a)
        {
            f.Fail("calibration_due", $"the calibration falls due ({b:yyyy-MM-dd}) before it was made ({a:yyyy-MM-dd})");
        }

        // The accuracy the calibration states, each figure optional: ±(per cent of reading + fixed part).
        var accuracy = InstrumentAccuracy.Of(
            f.Number("time_accuracy_pct", false, 0, 100, "%", allowZero: true), f.Number("time_accuracy_s", false, 0, 10, "s", allowZero: true),
            f.Number("current_accuracy_pct", false, 0, 100, "%", allowZero: true), f.Number("current_accuracy_a", false, 0, 100_000, "A", allowZero: true),
            f.Number("resistance_accuracy_pct", false, 0, 100, "%", allowZero: true), f.Number("resistance_accuracy_uohm", false, 0, 1_000_000, "µΩ", allowZero: true),
            f.Number("insulation_accuracy_pct", false, 0, 100, "%", allowZero: true), f.Number("coverage_factor", false, 1, 4, "(coverage factor)"));
        return f.Ok && name is not null && kind is not null && serial is not null && on is { } x && due is { } y
            ? new InstrumentCalibration(name, kind, serial, x, y) { Accuracy = accuracy }
            : null;
    }

    private static DateOnly? Missing(RowFields f, string column)
    {
        f.Fail(column, "a date is required here (yyyy-MM-dd)");
        return null;
    }

    public static AmbientTableRow? Ambient(RowFields f)
    {
        var table = f.RequiredText("table", "the table name");
        var ambient = f.Number("ambient", true, -60, 150, "C", allowZero: true);
        var factor = f.Number("current_factor", true, 0.5, 1.5, "(factor)");
        if (!f.Ok || table is null || ambient is null || factor is null)
        {
            return null;
        }

        return new AmbientTableRow(table, new AmbientPoint(Celsius.Of(ambient.Value), factor.Value));
    }
}
