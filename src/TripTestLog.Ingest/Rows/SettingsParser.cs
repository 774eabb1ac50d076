using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Ingest.Rows;

/// <summary>Reads the settings columns a register row's family needs, with the lab-policy defaults where a column is blank.</summary>
internal static class SettingsParser
{
    public static DeviceSettings? Parse(RowFields f, DeviceFamily family, Amperes rated) => family switch
    {
        DeviceFamily.Iec60898 => Miniature(f, allowDc: true),
        DeviceFamily.Iec61009 => Miniature(f, allowDc: false),
        DeviceFamily.Iec60947Electronic => Electronic(f, rated),
        DeviceFamily.Iec60947ThermalMagnetic => ThermalMagnetic(f, rated),
        DeviceFamily.RelayIdmt => Relay(f),
        _ => f.RequiredText("curve_table", "the curve table a curve-table device is judged by") is { } t ? new CurveTableSettings(t) : null,
    };

    private static Iec60898Settings? Miniature(RowFields f, bool allowDc)
    {
        var text = f.RequiredText("curve", "the trip curve (B, C or D) of a miniature breaker or RCBO");
        TripCurve? curve = text is not null && TextCodes.TripCurve.TryParse(text, out var parsed) ? parsed : null;
        if (text is not null && curve is null)
        {
            f.Fail("curve", $"'{text}' is not an IEC 60898-1 curve; write B, C or D");
        }

        var supplyText = f.OptionalText("supply");
        Supply? supply = supplyText is null ? Supply.Ac
            : TextCodes.Supply.TryParse(supplyText, out var s) && (allowDc || s == Supply.Ac) ? s : null;
        if (supply is null)
        {
            f.Fail("supply", allowDc ? $"'{supplyText}' is not a supply; write ac or dc" : $"'{supplyText}': an iec61009 RCBO is judged on ac only; write ac or leave it blank");
        }
        else if (supply == Supply.Dc && curve == TripCurve.D)
        {
            f.Fail("curve", "IEC 60898-2 admits only curves B and C for d.c.; write B or C, or supply ac");
        }

        return f.Ok && curve is { } c && supply is { } chosen ? new Iec60898Settings(c) { Supply = chosen } : null;
    }

    private static ElectronicTripSettings? Electronic(RowFields f, Amperes rated)
    {
        var ir = Required(f, "ir", "the long-time pickup Ir");
        var tr = Time(f, "tr", true, "the long-time delay tr", minimum: 0.1);
        var reference = f.Number("tr_ref_multiple", false, 1.5, 20, "x Ir") ?? LabPolicy.TrReferenceMultiple;
        var isd = f.Number("isd", false, 0.1, PlausibleRange.MaxCurrentA, "A");
        var tsd = Time(f, "tsd", false, "the short-time delay tsd");
        var i2t = f.Flag("tsd_i2t", false);
        var memory = f.Flag("thermal_memory", false);
        var ii = f.Number("ii", false, 0.1, PlausibleRange.MaxCurrentA, "A");
        var tolerance = Tolerance(f, LabPolicy.ElectronicTimeTolerance);
        var inst = Time(f, "inst_max", false, "the instantaneous clearing limit") ?? LabPolicy.InstantaneousMax.Value;

        if (isd.HasValue != tsd.HasValue)
        {
            f.Fail(isd.HasValue ? "tsd" : "isd", "give the short-time pickup isd_a and its delay tsd_s together, or neither");
        }

        CheckAbove(f, "ir", ir, null, rated.Value, "the rated current", above: false);
        CheckAbove(f, "isd", isd, ir, null, "Ir", above: true);
        CheckAbove(f, "ii", ii, ir, null, "Ir", above: true);
        if (!f.Ok || ir is null || tr is null || tolerance is null)
        {
            return null;
        }

        return new ElectronicTripSettings(Amperes.Of(ir.Value), Seconds.Of(tr.Value), reference,
            isd is { } s ? Amperes.Of(s) : null, tsd is { } d ? Seconds.Of(d) : null, i2t,
            ii is { } i ? Amperes.Of(i) : null, tolerance.Value, Seconds.Of(inst))
        {
            ThermalMemory = memory,
        };
    }

    private static ThermalMagneticSettings? ThermalMagnetic(RowFields f, Amperes rated)
    {
        var ir = Required(f, "ir", "the thermal setting Ir");
        var im = Required(f, "im", "the magnetic setting Im");
        var inst = Time(f, "inst_max", false, "the magnetic clearing limit") ?? LabPolicy.InstantaneousMax.Value;
        CheckAbove(f, "ir", ir, null, rated.Value, "the rated current", above: false);
        CheckAbove(f, "im", im, ir, null, "Ir", above: true);
        return f.Ok && ir is { } r && im is { } m ? new ThermalMagneticSettings(Amperes.Of(r), Amperes.Of(m), Seconds.Of(inst)) : null;
    }

    private static RelaySettings? Relay(RowFields f)
    {
        var text = f.RequiredText("curve", "the relay curve");
        IdmtCurve? curve = null;
        if (text is not null)
        {
            if (CurveCodes.TryParse(text, out var c))
            {
                curve = c;
            }
            else
            {
                f.Fail("curve", $"'{text}' is not a relay curve; write one of {string.Join(", ", CurveCodes.All)}");
            }
        }

        var pickup = Required(f, "pickup", "the relay pickup");
        var tms = f.Number("tms", true, 0.01, 15, "(multiplier)");
        var highSet = f.Number("highset", false, 0.1, PlausibleRange.MaxCurrentA, "A");
        var delay = Time(f, "highset_delay", false, "the high-set delay");
        var tolerance = Tolerance(f, LabPolicy.RelayTimeTolerance);
        var pickupTolerance = f.Number("pickup_tolerance_pct", false, 0, 50, "%", allowZero: true) is { } p ? p / 100 : LabPolicy.RelayPickupTolerance;
        var opening = Time(f, "opening_time", false, "the breaker opening time") ?? 0;
        if (highSet.HasValue != delay.HasValue)
        {
            f.Fail(highSet.HasValue ? "highset_delay" : "highset", "give the high-set pickup highset_a and its delay highset_delay_s together, or neither");
        }

        CheckAbove(f, "highset", highSet, pickup, null, "the pickup", above: true);
        if (!f.Ok || curve is null || pickup is null || tms is null || tolerance is null)
        {
            return null;
        }

        return new RelaySettings(curve.Value, Amperes.Of(pickup.Value), tms.Value, highSet is { } h ? Amperes.Of(h) : null,
            delay is { } d ? Seconds.Of(d) : null, tolerance.Value, pickupTolerance, Seconds.Of(opening));
    }

    private static double? Required(RowFields f, string column, string what)
    {
        if (!f.Has(column))
        {
            f.Fail(column, $"{what} is required for this family (column {column}_a)");
            return null;
        }

        return f.Number(column, true, 0.1, PlausibleRange.MaxCurrentA, "A");
    }

    private static double? Time(RowFields f, string column, bool required, string what, double minimum = 0)
    {
        if (required && !f.Has(column))
        {
            f.Fail(column, $"{what} is required for this family (column {column}_s)");
            return null;
        }

        return f.Number(column, false, minimum, PlausibleRange.MaxTimeS, "s", allowZero: minimum == 0);
    }

    private static TimeTolerance? Tolerance(RowFields f, TimeTolerance policy)
    {
        var pct = f.Number("time_tolerance_pct", false, 0, 90, "%", allowZero: true);
        var floor = f.Number("time_tolerance_min", false, 0, 10, "s", allowZero: true);
        return TimeTolerance.Of(pct is { } p ? p / 100 : policy.Fraction, floor is { } s ? Seconds.Of(s) : policy.Floor);
    }

    private static void CheckAbove(RowFields f, string column, double? value, double? lower, double? upper, string what, bool above)
    {
        if (value is not { } v)
        {
            return;
        }

        if (above && lower is { } lo && v <= lo)
        {
            f.Fail(column, $"must be above {what} ({lo:0.###} A)");
        }

        if (!above && upper is { } hi && v > hi)
        {
            f.Fail(column, $"must not exceed {what} ({hi:0.###} A)");
        }
    }
}
