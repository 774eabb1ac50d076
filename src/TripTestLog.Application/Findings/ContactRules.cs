using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Application.Findings;

/// <summary>
/// The findings a device's contact resistance readings raise. Each test's readings of a pole are referred to 20 °C
/// (copper, IEC 60228) where a temperature is recorded, and the median kept: labs often take three readings, operating
/// the breaker between them (common practice).
/// </summary>
internal static class ContactRules
{
    /// <summary>One pole at one test: the median of its readings.</summary>
    internal sealed record PoleResult(AssetTag Tag, string Pole, TestedAt At, TestStage Stage, double Corrected, double Measured, bool TemperatureKnown,
        double TestCurrent, string Instrument, IReadOnlyList<RecordSource> Sources);

    /// <summary>Whether a pole's reading came from an instrument traceable on the day under the lab's policy.</summary>
    internal static bool Traceable(PoleResult pole, InstrumentRegister instruments, FindingPolicy policy) =>
        UntraceableInTrend.Traceable(instruments, policy, pole.Instrument, pole.At.Date);

    /// <summary>The tests, each as its poles' results, in time order (as-found before as-left on a day).</summary>
    public static IEnumerable<List<PoleResult>> Sessions(IReadOnlyList<StoredMeasurement<ContactMeasurement>> readings) =>
        readings.GroupBy(r => (r.Measurement.TestedAt.Date, r.Measurement.Stage))
            .OrderBy(g => g.Key.Date).ThenBy(g => g.Key.Stage)
            .Select(g => g.GroupBy(r => r.Measurement.Pole.Code).OrderBy(p => p.Key, StringComparer.Ordinal).Select(Pole).ToList());

    private static PoleResult Pole(IGrouping<string, StoredMeasurement<ContactMeasurement>> readings)
    {
        var list = readings.ToList();
        var last = list[^1].Measurement;
        var known = list.All(r => r.Measurement.Temperature is not null);
        return new PoleResult(last.Tag, readings.Key, last.TestedAt, last.Stage,
            RobustStatistics.Median(list.Select(r => known ? CopperCorrection.ToTwentyCelsius(r.Measurement.Resistance, r.Measurement.Temperature!.Value).Value : r.Measurement.Resistance.Value)),
            RobustStatistics.Median(list.Select(r => r.Measurement.Resistance.Value)),
            known,
            list.Min(r => r.Measurement.TestCurrent.Value),
            last.Instrument,
            [.. list.Select(r => new RecordSource(r.SourceFile, r.SourceLine))]);
    }

    /// <summary>Over the limit, pole spread, rise over baseline, low test current and instruments, test by test.</summary>
    public static void States(DeviceHistory history, IReadOnlyList<StoredMeasurement<ContactMeasurement>> readings, FindingLedger ledger,
        FindingPolicy policy, InstrumentRegister instruments)
    {
        var baseline = new Dictionary<string, PoleResult>(StringComparer.Ordinal);
        foreach (var session in Sessions(readings))
        {
            var device = history.InForceOn(session[0].At.Date);
            var asFound = session[0].Stage == TestStage.AsFound;
            var lowest = session.Min(p => p.Corrected);
            foreach (var pole in session)
            {
                if (asFound)
                {
                    baseline.TryAdd(pole.Pole, pole);
                }

                OverLimit(device, pole, ledger, asFound, policy, instruments);
                Spread(pole, lowest, session.Count, ledger, policy, asFound);
                Rise(baseline.GetValueOrDefault(pole.Pole), pole, ledger, policy, asFound);
            }

            if (asFound)
            {
                TestCurrent(device, session, ledger, policy);
                SessionInstrument.Judge(TestKind.Contact, session[0].Tag, session[0].At, [.. session.Select(p => (p.Instrument, (IEnumerable<RecordSource>)p.Sources))], ledger, policy, instruments);
            }
        }
    }

    private static void OverLimit(Device device, PoleResult pole, FindingLedger ledger, bool asFound, FindingPolicy policy, InstrumentRegister instruments)
    {
        if (device.ContactLimit is not { } limit)
        {
            return;
        }

        // The decision rule: under guarded the limit must be broken (or cleared) by the guard band; a reading within it,
        // under guarded or non-binary, asks for a retest with a more accurate instrument.
        var accuracy = policy.Decision.AccuracyOf(instruments, pole.Instrument, pole.At.Date);
        var expanded = accuracy.CoverageFactor * accuracy.ResistanceStandard(pole.Measured) * (pole.Measured > 0 ? pole.Corrected / pole.Measured : 1);
        var guard = Uncertain.Guard(policy, expanded);
        var within = policy.DecisionRule != Domain.Verdicts.DecisionRule.Simple && Math.Abs(pole.Corrected - limit.Value) < guard;
        var over = policy.DecisionRule == Domain.Verdicts.DecisionRule.Guarded ? pole.Corrected > limit.Value + guard : pole.Corrected > limit.Value;
        Uncertain.Settle(ledger, "accuracy|contact|" + pole.Pole, within, asFound, pole.At, () => Make(FindingKind.RetestAccuracy, Severity.Investigate, pole.At, pole,
            new ContactFacts.WithinUncertainty(pole.Stage, pole.Pole, pole.Corrected, limit.Value, guard, expanded, accuracy, policy.DecisionRule))
            with { Value = new Reading(pole.Corrected, ReadingUnit.MicroOhms), Limit = new Reading(limit.Value, ReadingUnit.MicroOhms), Instrument = pole.Instrument,
                Measured = MeasuredOf(pole), Correction = CorrectionOf(pole),
                Policy = PolicyFile.Setting(policy, "decision_rule") });
        if (within && !over && policy.DecisionRule == Domain.Verdicts.DecisionRule.Guarded)
        {
            return;
        }

        var subject = "over|" + pole.Pole;
        if (over)
        {
            ledger.Raise(subject, Make(FindingKind.ContactOverLimit, Severity.Act, pole.At, pole,
                new ContactFacts.OverLimit(pole.Stage, pole.Pole, ReadingOf(pole), limit.Value))
                with { Value = new Reading(pole.Corrected, ReadingUnit.MicroOhms), Limit = new Reading(limit.Value, ReadingUnit.MicroOhms),
                    Measured = MeasuredOf(pole), Correction = CorrectionOf(pole) });
        }
        else
        {
            Settle(ledger, subject, pole, asFound, new Settler.PoleWithinLimit(pole.Pole, pole.Corrected));
        }
    }

    private static void Spread(PoleResult pole, double lowest, int poles, FindingLedger ledger, FindingPolicy policy, bool asFound)
    {
        if (poles < 2)
        {
            return;
        }

        var subject = "spread|" + pole.Pole;
        // Every pole of a test is usually referred to 20 °C by the same factor, so the ratio carries a rounding error
        // (1500/1000 at 15 °C gives 50.000000000000014 %): compared at the stated precision (TripRules.Tolerance).
        var above = (pole.Corrected / lowest - 1) * 100;
        if (above > policy.ContactSpreadPercent + TripRules.Tolerance)
        {
            // The shipped default is the ANSI/NETA customary guide; any other number is the lab's own.
            var basis = FindingPolicy.Default.ContactSpreadPercent == policy.ContactSpreadPercent ? SpreadBasis.CustomaryGuide : SpreadBasis.LabPolicy;
            ledger.Raise(subject, Make(FindingKind.ContactPoleSpread, Severity.Investigate, pole.At, pole,
                new ContactFacts.PoleSpread(pole.Stage, pole.Pole, above, pole.Corrected, lowest, policy.ContactSpreadPercent, basis))
                with { Value = new Reading(above, ReadingUnit.Percent), Limit = new Reading(policy.ContactSpreadPercent, ReadingUnit.Percent),
                    Policy = PolicyFile.Setting(policy, "contact_spread_percent") });
        }
        else
        {
            Settle(ledger, subject, pole, asFound, new Settler.PoleWithinSpread(pole.Pole));
        }
    }

    private static void Rise(PoleResult? first, PoleResult pole, FindingLedger ledger, FindingPolicy policy, bool asFound)
    {
        if (first is null || first.At.Date >= pole.At.Date)
        {
            return;
        }

        var subject = "rise|" + pole.Pole;
        var rise = (pole.Corrected / first.Corrected - 1) * 100;
        if (rise > policy.ContactRisePercent)
        {
            ledger.Raise(subject, Make(FindingKind.ContactRise, Severity.Plan, pole.At, pole,
                new ContactFacts.Rise(pole.Stage, pole.Pole, rise, first.At.Date, first.Corrected, pole.Corrected))
                with { Value = new Reading(rise, ReadingUnit.Percent), Limit = new Reading(policy.ContactRisePercent, ReadingUnit.Percent),
                    Policy = PolicyFile.Setting(policy, "contact_rise_percent"), RestsOn = [.. first.Sources, .. pole.Sources] });
        }
        else
        {
            Settle(ledger, subject, pole, asFound, new Settler.PoleNearBaseline(pole.Pole));
        }
    }

    private static void TestCurrent(Device device, List<PoleResult> session, FindingLedger ledger, FindingPolicy policy)
    {
        var (least, setting) = policy.ContactTestCurrent(device.RatedCurrent.Value);
        var low = session.Where(p => p.TestCurrent < least).ToList();
        if (low.Count == 0)
        {
            ledger.Clear("current", session[0].At, new Settler.AdequateTestCurrent());
            return;
        }

        var current = low.Min(p => p.TestCurrent);
        ledger.Raise("current", Make(FindingKind.ContactLowTestCurrent, Severity.Investigate, session[0].At, low[0],
            new ContactFacts.LowTestCurrent(current, least, device.RatedCurrent.Value)) with
        {
            Pole = null,
            Value = new Reading(current, ReadingUnit.Amperes),
            Limit = new Reading(least, ReadingUnit.Amperes),
            Policy = PolicyFile.Setting(policy, setting),
            RestsOn = [.. low.SelectMany(p => p.Sources)],
        });
    }

    /// <summary>
    /// contact-trend-limit: a Theil–Sen line through a pole's readings since its last repair reaches the limit before
    /// <paramref name="window"/> (the due date before any forecast); the text names <paramref name="due"/>, the device's one due date.
    /// </summary>
    public static void TrendLimit(DeviceHistory history, IReadOnlyList<StoredMeasurement<ContactMeasurement>> readings, FindingLedger ledger,
        FindingPolicy policy, InstrumentRegister instruments, DateOnly window, DateOnly due, DateOnly asOf)
    {
        if (history.Latest.ContactLimit is not { } limit)
        {
            return;
        }

        var sessions = Sessions(readings).SelectMany(s => s).ToList();
        foreach (var pole in sessions.GroupBy(p => p.Pole))
        {
            // Readings since the pole's last as-left test: a repair starts a new trend.
            var list = pole.ToList();
            var repaired = list.FindLastIndex(p => p.Stage == TestStage.AsLeft);
            var since = list.Skip(repaired + 1).Where(p => p.Stage == TestStage.AsFound).ToList();
            var found = UntraceableInTrend.Kept(since, p => Traceable(p, instruments, policy), policy);
            var untraceable = since.Count(p => !Traceable(p, instruments, policy));
            if (found.Count == 0 || found.Select(p => p.At.Date).Distinct().Count() < policy.TrendMinimumTests || found[^1].Corrected > limit.Value)
            {
                continue;
            }

            var line = TheilSen.Fit([.. found.Select(p => new TrendPoint(TrendPoint.YearOf(p.At.Date), p.Corrected))]);
            var until = Math.Min(TrendPoint.YearOf(window), line?.LastYear + policy.ForecastHorizonYears ?? 0);
            if (line is null || line.Slope <= 0 || line.Reaches(limit.Value) is not { } year || year > until)
            {
                continue;
            }

            var uncertain = line.Spread > limit.Value * policy.ContactTrendScatterPercent / 100;
            var on = TrendPoint.DateOf(year);
            var last = found[^1];
            ledger.Add(Make(FindingKind.ContactTrendLimit, uncertain ? Severity.Investigate : Severity.Plan, last.At, last,
                new ContactFacts.TrendLimit(last.Pole, line.Count, line.Slope, limit.Value, new ForecastDates(on, due, asOf), uncertain,
                    UntraceableInTrend.Share(untraceable, found.Count, policy))) with
            {
                Value = new Reading(last.Corrected, ReadingUnit.MicroOhms),
                Measured = MeasuredOf(last),
                Correction = CorrectionOf(last),
                Limit = new Reading(limit.Value, ReadingUnit.MicroOhms),
                Policy = $"{PolicyFile.Setting(policy, "trend_min_tests")}; {PolicyFile.Setting(policy, "contact_trend_scatter_percent")}",
                ForecastOn = on,
                Trend = line,
                RestsOn = [.. found.SelectMany(p => p.Sources)],
                UntraceableReadings = untraceable == 0 ? null : untraceable,
            });
        }
    }

    private static void Settle(FindingLedger ledger, string subject, PoleResult pole, bool asFound, Settler what)
    {
        if (asFound)
        {
            ledger.Clear(subject, pole.At, what);
        }
        else
        {
            ledger.Confirm(subject, pole.At, what);
        }
    }

    private static Finding Make(FindingKind kind, Severity severity, TestedAt at, PoleResult pole, FindingFacts facts) =>
        new(kind, severity, pole.Tag, at, facts, pole.Sources) { Pole = pole.Pole };

    /// <summary>The copper rule contact readings are referred to 20 °C by (a fixed rule, not lab policy).</summary>
    public const string CopperRule = "copper, 0.00393 per K (IEC 60228)";

    private static Reading MeasuredOf(PoleResult pole) => new(pole.Measured, ReadingUnit.MicroOhms);

    private static string? CorrectionOf(PoleResult pole) => pole.TemperatureKnown ? CopperRule : null;

    private static ContactFacts.PoleReading ReadingOf(PoleResult pole) => new(pole.Corrected, pole.Measured, pole.TemperatureKnown);
}
