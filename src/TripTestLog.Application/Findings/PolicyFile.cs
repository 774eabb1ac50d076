using System.Globalization;
using System.Text;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Instruments;

namespace TripTestLog.Application.Findings;

/// <summary>
/// The lab policy file: one "key = value" per line, '#' starts a comment, keys as <see cref="Write"/> lists them.
/// A key left out keeps its default; an unknown key or a bad value is refused with its line, never ignored.
/// </summary>
public static class PolicyFile
{
    /// <summary>The file name looked for beside the database.</summary>
    public const string BesideDatabase = "lab-policy.conf";

    private sealed record Key(string Name, string Comment, Func<FindingPolicy, string> Get, Func<FindingPolicy, string, FindingPolicy?> Set);

    private static readonly Key[] Keys =
    [
        Number("trip_drift_time_percent", "trip-drift: move of the trip time from its baseline, either way (lab policy)",
            p => p.TripDriftTimePercent, (p, v) => p with { TripDriftTimePercent = v }, 1, 1000),
        Number("trip_drift_band_percent", "trip-drift: move of the place within the band, % of its log width (lab policy)",
            p => p.TripDriftBandPercent, (p, v) => p with { TripDriftBandPercent = v }, 1, 100),
        Whole("trend_min_tests", "fewest as-found tests on distinct dates a trend rests on (at least 3)",
            p => p.TrendMinimumTests, (p, v) => p with { TrendMinimumTests = v }, 3, 100),
        Number("forecast_horizon_years", "furthest a trend is extrapolated past the latest test (lab policy)",
            p => p.ForecastHorizonYears, (p, v) => p with { ForecastHorizonYears = v }, 0.5, 50),
        Number("trip_trend_scatter_band_percent", "trip trend scatter, % of the band's log width, beyond which it is uncertain",
            p => p.TripTrendScatterBandPercent, (p, v) => p with { TripTrendScatterBandPercent = v }, 1, 100),
        Number("contact_trend_scatter_percent", "contact trend scatter, % of the limit, beyond which it is uncertain",
            p => p.ContactTrendScatterPercent, (p, v) => p with { ContactTrendScatterPercent = v }, 1, 100),
        Whole("peer_min_devices", "peer-outlier: fewest devices in a peer group, the device included (lab policy)",
            p => p.PeerMinimumDevices, (p, v) => p with { PeerMinimumDevices = v }, 5, 100000),
        Number("peer_z_limit", "peer-outlier: modified z-score limit (Iglewicz and Hoaglin: 3.5)",
            p => p.PeerScoreLimit, (p, v) => p with { PeerScoreLimit = v }, 1, 100),
        Number("peer_min_band_percent", "peer-outlier: least distance from the peers' median, % of the band's log width",
            p => p.PeerMinimumBandPercent, (p, v) => p with { PeerMinimumBandPercent = v }, 0, 100),
        Number("contact_spread_percent", "contact-pole-spread: % above the lowest pole (ANSI/NETA customary guide: 50)",
            p => p.ContactSpreadPercent, (p, v) => p with { ContactSpreadPercent = v }, 1, 1000),
        Number("contact_rise_percent", "contact-rise: % over the pole's baseline (lab policy)",
            p => p.ContactRisePercent, (p, v) => p with { ContactRisePercent = v }, 1, 1000),
        Number("contact_current_small_a", "contact-low-test-current: least DC test current below the large rating, A",
            p => p.ContactCurrentSmallAmperes, (p, v) => p with { ContactCurrentSmallAmperes = v }, 0.1, 1000),
        Number("contact_current_large_a", "contact-low-test-current: least DC test current at and above it, A",
            p => p.ContactCurrentLargeAmperes, (p, v) => p with { ContactCurrentLargeAmperes = v }, 0.1, 1000),
        Number("contact_large_rating_a", "the rating, A, from which the larger test current applies",
            p => p.ContactLargeRating, (p, v) => p with { ContactLargeRating = v }, 1, 10000),
        new("insulation_table", "insulation-below-minimum: " + TextCodes.InsulationTable.Choices,
            p => TextCodes.InsulationTable.Of(p.InsulationTable),
            (p, v) => TextCodes.InsulationTable.TryParse(v, out var t) ? p with { InsulationTable = t } : null),
        new("insulation_correction", "insulation referred to 20 °C: halving-10k (halves per 10 K rise; over-corrects hot\n"
                + "#   solid insulation), solid-insulation (tenfold per 50 K, × 2.5 at 40 °C) or none (as measured)",
            p => TextCodes.InsulationCorrection.Of(p.InsulationCorrection),
            (p, v) => TextCodes.InsulationCorrection.TryParse(v, out var c) ? p with { InsulationCorrection = c } : null),
        new("untraceable_readings", "trends and charts: readings from an instrument not traceable on the day: "
                + TextCodes.UntraceableReadings.Choices,
            p => TextCodes.UntraceableReadings.Of(p.UntraceableReadings),
            (p, v) => TextCodes.UntraceableReadings.TryParse(v, out var u) ? p with { UntraceableReadings = u } : null),
        Number("insulation_fall_percent_per_year", "insulation-falling: a trend falling faster than this (lab policy)",
            p => p.InsulationFallPercentPerYear, (p, v) => p with { InsulationFallPercentPerYear = v }, 1, 99),
        Number("ambient_note_kelvin", "ambient warning: a thermal verdict notes an ambient this far from its reference",
            p => p.AmbientNoteKelvin, (p, v) => p with { AmbientNoteKelvin = v }, 5, 100),
        Number("point_window_pct", "verdicts: a test this close (per cent) to a standard point's current tests that point",
            p => p.PointWindowPercent, (p, v) => p with { PointWindowPercent = v }, 0.5, 10),
        new("require_registered_instruments", "instrument-unregistered: yes or no",
            p => p.RequireRegisteredInstruments ? "yes" : "no",
            (p, v) => v switch { "yes" => p with { RequireRegisteredInstruments = true }, "no" => p with { RequireRegisteredInstruments = false }, _ => null }),
        Number("store_wait_minutes", "minutes a command waits for another process's write before it gives up (lab policy)",
            p => p.StoreWaitMinutes, (p, v) => p with { StoreWaitMinutes = v }, 0.05, 1440),
        Whole("fleet_min_devices", "which models fail: no figure for fewer devices than this (lab policy)",
            p => p.FleetMinimumDevices, (p, v) => p with { FleetMinimumDevices = v }, 1, 100000),
        Number("fleet_window_years", "which models fail: years of as-found tests counted, back from the day judged",
            p => p.FleetWindowYears, (p, v) => p with { FleetWindowYears = v }, 0.5, 50),
        new("decision_rule", "verdicts and limits against the measurement uncertainty (ILAC-G8): " + TextCodes.DecisionRule.Choices,
            p => TextCodes.DecisionRule.Of(p.DecisionRule),
            (p, v) => TextCodes.DecisionRule.TryParse(v, out var r) ? p with { DecisionRule = r } : null),
        Number("guard_band_factor", "guarded: the guard band as a multiple of the expanded uncertainty U (ILAC-G8: 1)",
            p => p.GuardBandFactor, (p, v) => p with { GuardBandFactor = v }, 0, 3),
        Accuracy("default_time_accuracy_pct", "time accuracy where the instrument register states none, % of reading",
            a => a.TimePercent, (a, v) => a with { TimePercent = v }, 100),
        Accuracy("default_time_accuracy_s", "... plus this fixed part, s", a => a.TimeSeconds, (a, v) => a with { TimeSeconds = v }, 10),
        Accuracy("default_current_accuracy_pct", "current accuracy where the register states none, % of reading",
            a => a.CurrentPercent, (a, v) => a with { CurrentPercent = v }, 100),
        Accuracy("default_current_accuracy_a", "... plus this fixed part, A", a => a.CurrentAmperes, (a, v) => a with { CurrentAmperes = v }, 100000),
        Accuracy("default_resistance_accuracy_pct", "contact resistance accuracy where the register states none, % of reading",
            a => a.ResistancePercent, (a, v) => a with { ResistancePercent = v }, 100),
        Accuracy("default_resistance_accuracy_uohm", "... plus this fixed part, µΩ", a => a.ResistanceMicroOhms, (a, v) => a with { ResistanceMicroOhms = v }, 1000000),
        Accuracy("default_insulation_accuracy_pct", "insulation accuracy where the register states none, % of reading",
            a => a.InsulationPercent, (a, v) => a with { InsulationPercent = v }, 100),
        Number("default_coverage_factor", "coverage factor k of U = k u where the register states none (GUM: 2, about 95 %)",
            p => p.DefaultAccuracy.CoverageFactor ?? 2, (p, v) => p with { DefaultAccuracy = p.DefaultAccuracy with { CoverageFactor = v } }, 1, 4),
        .. Enum.GetValues<ConditionGrade>().Select(g => Whole($"due_months.{TextCodes.Grade.Of(g)}",
            g == ConditionGrade.Untested ? "months from commissioning to the first as-found test of a device never tested"
                : $"months from the latest as-found test to the next, grade {TextCodes.Grade.Of(g)}",
            p => p.DueMonths[g], (p, v) => p with { DueMonths = new Dictionary<ConditionGrade, int>(p.DueMonths) { [g] = v } }, 0, 240)),
    ];

    /// <summary>The policy text of <paramref name="policy"/>: every key with its value and what it is for.</summary>
    public static string Write(FindingPolicy policy)
    {
        var text = new StringBuilder()
            .Append("# TripTestLog lab policy. One \"key = value\" per line; a key left out keeps its default.\n")
            .Append("# Per-family test intervals: due_months.FAMILY.GRADE = N,\n#   e.g. due_months.iec60947-electronic.sound = 24\n");
        foreach (var key in Keys)
        {
            text.Append("\n# ").Append(key.Comment).Append('\n').Append(key.Name).Append(" = ").Append(key.Get(policy)).Append('\n');
        }

        foreach (var ((family, grade), months) in policy.FamilyDueMonths.OrderBy(f => f.Key.Family).ThenBy(f => f.Key.Grade))
        {
            text.Append("\ndue_months.").Append(TextCodes.Family.Of(family)).Append('.').Append(TextCodes.Grade.Of(grade))
                .Append(" = ").Append(months.ToString(CultureInfo.InvariantCulture)).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>"key = value" for one setting of <paramref name="policy"/>, as a finding records it.</summary>
    public static string Setting(FindingPolicy policy, string key) =>
        $"{key} = {Keys.Single(k => k.Name == key).Get(policy)}";

    /// <summary>
    /// Reads a policy file over the defaults; returns null and sets <paramref name="problem"/> ("FILE line N: ...")
    /// when a line cannot be used.
    /// </summary>
    public static FindingPolicy? Read(TextReader reader, string fileName, out string? problem)
    {
        ArgumentNullException.ThrowIfNull(reader);
        var policy = FindingPolicy.Default;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var number = 0;
        while (reader.ReadLine() is { } raw)
        {
            number++;
            var line = raw.Split('#', 2)[0].Trim();
            if (line.Length == 0)
            {
                continue;
            }

            var parts = line.Split('=', 2);
            if (parts.Length != 2 || parts[0].Trim().Length == 0)
            {
                problem = $"{fileName} line {number}: expected \"key = value\", got \"{line}\"";
                return null;
            }

            var (name, value) = (parts[0].Trim(), parts[1].Trim());
            if (!seen.Add(name))
            {
                problem = $"{fileName} line {number}: {name} is set twice";
                return null;
            }

            var next = Apply(policy, name, value, out var reason);
            if (next is null)
            {
                problem = $"{fileName} line {number}: {reason}";
                return null;
            }

            policy = next;
        }

        problem = null;
        return policy;
    }

    private static FindingPolicy? Apply(FindingPolicy policy, string name, string value, out string reason)
    {
        var key = Keys.FirstOrDefault(k => k.Name == name);
        if (key is not null)
        {
            reason = $"{name} = {value} is not allowed ({key.Comment.Replace("\n#   ", " ", StringComparison.Ordinal)})";
            return key.Set(policy, value);
        }

        var parts = name.Split('.');
        if (parts.Length == 3 && parts[0] == "due_months" && TextCodes.Family.TryParse(parts[1], out var family) && TextCodes.Grade.TryParse(parts[2], out var grade))
        {
            reason = $"{name} must be a whole number of months from 0 to 240; got {value}";
            return int.TryParse(value, NumberStyles.None, CultureInfo.InvariantCulture, out var months) && months <= 240
                ? policy with { FamilyDueMonths = new Dictionary<(DeviceFamily, ConditionGrade), int>(policy.FamilyDueMonths) { [(family, grade)] = months } }
                : null;
        }

        reason = $"unknown key {name}; the keys are listed by `triptestlog policy`";
        return null;
    }

    private static Key Number(string name, string comment, Func<FindingPolicy, double> get, Func<FindingPolicy, double, FindingPolicy> set, double min, double max) =>
        new(name, $"{comment} [{min.ToString(CultureInfo.InvariantCulture)} to {max.ToString(CultureInfo.InvariantCulture)}]",
            p => get(p).ToString("0.###", CultureInfo.InvariantCulture),
            (p, v) => double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out var x) && x >= min && x <= max ? set(p, x) : null);

    // One default accuracy figure: a number from 0 to max, stored in the policy's default instrument accuracy.
    private static Key Accuracy(string name, string comment, Func<InstrumentAccuracy, double?> get, Func<InstrumentAccuracy, double, InstrumentAccuracy> set, double max) =>
        Number(name, comment + " (lab policy)", p => get(p.DefaultAccuracy) ?? 0, (p, v) => p with { DefaultAccuracy = set(p.DefaultAccuracy, v) }, 0, max);

    private static Key Whole(string name, string comment, Func<FindingPolicy, int> get, Func<FindingPolicy, int, FindingPolicy> set, int min, int max) =>
        new(name, $"{comment} [{min} to {max}]", p => get(p).ToString(CultureInfo.InvariantCulture),
            (p, v) => int.TryParse(v, NumberStyles.None, CultureInfo.InvariantCulture, out var x) && x >= min && x <= max ? set(p, x) : null);
}
