using System.Globalization;
using TripTestLog.Application.Findings;
using TripTestLog.Domain.Codes;
using TripTestLog.Wording;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The fields of one finding for programs, in their fixed order: the same names in `findings --json` and `--csv`, as
/// documented in the README. Values are a string, a number or null. Add fields at the end, never rename.
/// </summary>
internal static class FindingFields
{
    private static readonly (ReadingUnit Unit, string Suffix)[] Units =
    [
        (ReadingUnit.Seconds, "s"), (ReadingUnit.MicroOhms, "uohm"), (ReadingUnit.MegaOhms, "mohm"), (ReadingUnit.Amperes, "a"),
        (ReadingUnit.Percent, "percent"), (ReadingUnit.Score, "z"), (ReadingUnit.Days, "days"),
    ];

    public static readonly IReadOnlyList<(string Name, Func<DeviceCondition, Finding, object?> Value)> All =
    [
        ("asset_tag", (d, f) => f.Asset.Value),
        ("site", (d, f) => d.Device.Site),
        ("kind", (d, f) => TextCodes.FindingKind.Of(f.Kind)),
        ("severity", (d, f) => TextCodes.Severity.Of(f.Severity)),
        ("status", (d, f) => f.Open ? "open" : "closed"),
        ("pole", (d, f) => f.Pole),
        ("path", (d, f) => f.Path),
        ("point", (d, f) => f.Point),
        ("first_seen", (d, f) => Date(f.FirstSeen)),
        ("tested_at", (d, f) => f.TestedAt.ToString()),
        ("forecast_on", (d, f) => Date(f.ForecastOn)),
        .. Units.SelectMany(u => new (string, Func<DeviceCondition, Finding, object?>)[]
        {
            ($"value_{u.Suffix}", (d, f) => f.Value is { } v && v.Unit == u.Unit ? Math.Round(v.Amount, 4) : null),
            ($"limit_{u.Suffix}", (d, f) => f.Limit is { } l && l.Unit == u.Unit ? Math.Round(l.Amount, 4) : null),
        }),
        ("basis", (d, f) => f.Basis),
        ("policy", (d, f) => f.Policy),
        ("message", (d, f) => f.Message),
        ("standing", (d, f) => f.Standing),
        ("grade", (d, f) => TextCodes.Grade.Of(d.Grade)),
        ("due_on", (d, f) => Date(d.DueOn)),
        ("rests_on", (d, f) => string.Join("; ", f.RestsOn.Select(r => $"{r.File}:{r.Line.ToString(CultureInfo.InvariantCulture)}"))),

        // Added later, so at the end: volts (insulation-test-voltage).
        ("value_v", (d, f) => f.Value is { Unit: ReadingUnit.Volts } v ? Math.Round(v.Amount, 4) : null),
        ("limit_v", (d, f) => f.Limit is { Unit: ReadingUnit.Volts } l ? Math.Round(l.Amount, 4) : null),

        // Added later: a resistance value referred to 20 °C beside the reading as measured, the rule that referred it,
        // and how many readings a trend took from an untraceable instrument.
        ("measured_uohm", (d, f) => f.Measured is { Unit: ReadingUnit.MicroOhms } m ? Math.Round(m.Amount, 4) : null),
        ("measured_mohm", (d, f) => f.Measured is { Unit: ReadingUnit.MegaOhms } m ? Math.Round(m.Amount, 4) : null),
        ("correction", (d, f) => f.Correction),
        ("untraceable_readings", (d, f) => f.UntraceableReadings is { } n ? (double)n : null),
    ];

    private static string? Date(DateOnly? date) => date?.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
}
