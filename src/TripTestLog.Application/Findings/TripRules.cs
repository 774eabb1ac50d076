using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Trends;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Application.Findings;

/// <summary>The findings one device's judged trip tests raise: verdicts out of band, settings, instruments, drift and trends.</summary>
internal static class TripRules
{
    /// <summary>Out-of-band verdicts, settings that differ from the register, and untraceable instruments, test by test.</summary>
    public static void States(IReadOnlyList<JudgedTrip> trips, FindingLedger ledger)
    {
        foreach (var judged in trips)
        {
            var m = judged.Trip.Measurement;
            var a = judged.Assessment;
            var point = TripPoint.Of(judged);
            var subject = "band|" + point.Key;
            if (a.IsFailure)
            {
                var edge = a.Verdict == Verdict.TooEarly ? a.Band.Minimum : a.Band.Maximum;
                ledger.Raise(subject, new Finding(FindingKind.TripOutOfBand, a.Verdict == Verdict.TooLate ? Severity.OutOfService : Severity.Act,
                    m.Tag, m.TestedAt, new TripFacts.OutOfBandAt(m.Stage, point.Label, edge.Requirement, a.Reason), [Source(judged)])
                {
                    Point = point.Label,
                    Value = new Reading(m.Outcome.Time.Value, ReadingUnit.Seconds),
                    Limit = edge.Limit is { } t ? new Reading(t.Value, ReadingUnit.Seconds) : null,
                });
            }
            else if (a.Verdict == Verdict.Pass)
            {
                if (m.Stage == TestStage.AsFound)
                {
                    ledger.Clear(subject, m.TestedAt, new Settler.TripVerdict(Verdict.Pass, point.Label));
                }
                else
                {
                    ledger.Confirm(subject, m.TestedAt, new Settler.TripVerdict(Verdict.Pass, point.Label));
                }
            }

            Retest(judged, point, ledger);

            Settings(judged, ledger);
            Instrument(judged, ledger);
        }
    }

    // A result within the measurement uncertainty of its limit (under the guarded or non-binary rule) asks for a retest
    // with a more accurate instrument; a decided result at the point clears it.
    private static void Accuracy(JudgedTrip judged, TripPoint point, FindingLedger ledger)
    {
        var m = judged.Trip.Measurement;
        var a = judged.Assessment;
        var subject = "accuracy|" + point.Key;
        if (a.Uncertainty is not { Conditional: true } u)
        {
            if (a.Verdict != Verdict.NotAssessable)
            {
                ledger.Clear(subject, m.TestedAt, new Settler.TripVerdict(a.Verdict, point.Label, ClearOfUncertainty: true));
            }

            return;
        }

        ledger.Raise(subject, new Finding(FindingKind.RetestAccuracy, Severity.Investigate, m.Tag, m.TestedAt,
            new TripFacts.WithinUncertainty(m.Stage, point.Label, u.Rule, u.Conformity, a.Reason), [Source(judged)])
        {
            Point = point.Label,
            Instrument = m.Instrument,
            Value = new Reading(m.Outcome.Time.Value, ReadingUnit.Seconds),
        });
    }

    // A not-assessable verdict never vanishes: one open finding per device and point until a test there decides.
    private static void Retest(JudgedTrip judged, TripPoint point, FindingLedger ledger)
    {
        var m = judged.Trip.Measurement;
        var a = judged.Assessment;
        Accuracy(judged, point, ledger);
        if (a.Uncertainty is { Conditional: true } && a.Verdict == Verdict.NotAssessable)
        {
            // Withheld by the guard band: the retest it needs is one with a better instrument, raised above.
            return;
        }

        if (a.Verdict != Verdict.NotAssessable)
        {
            // A test that decides clears the retest at its own point, and at the standard's point it proved or broke.
            ledger.Clear("retest|" + point.Key, m.TestedAt, new Settler.TripVerdict(a.Verdict, point.Label));
            if (a.Point is { } decided)
            {
                ledger.Clear("retest|point|" + decided.Label, m.TestedAt, new Settler.TripVerdict(a.Verdict, point.Label));
            }

            return;
        }

        var subject = a.RetestAt is { } at ? "retest|point|" + at.Label : "retest|" + point.Key;
        ledger.Raise(subject, new Finding(FindingKind.RetestNeeded, Severity.Investigate, m.Tag, m.TestedAt,
            new TripFacts.NotAssessable(m.Stage, point.Label, a.Reason), [Source(judged)])
        {
            Point = point.Label,
        });
    }

    private static void Settings(JudgedTrip judged, FindingLedger ledger)
    {
        var m = judged.Trip.Measurement;
        if (m.FoundSettings is not { IsEmpty: false } found)
        {
            return;
        }

        var (applied, notes) = found.ApplyTo(judged.Device.Settings);
        if (applied == judged.Device.Settings)
        {
            ledger.Clear("settings", m.TestedAt, new Settler.RegisterSettings());
            return;
        }

        ledger.Raise("settings", new Finding(FindingKind.SettingsDiffer, Severity.Investigate, m.Tag, m.TestedAt,
            new TripFacts.SettingsDiffer([.. notes]), [Source(judged)]));
    }

    private static void Instrument(JudgedTrip judged, FindingLedger ledger)
    {
        var m = judged.Trip.Measurement;
        var untraced = judged.Findings.FirstOrDefault(f => f.Kind is FindingKind.CalibrationLapsed or FindingKind.InstrumentUnregistered);
        if (untraced?.Facts is not InstrumentFacts.Untraced { Trace: var trace })
        {
            ledger.Clear("instrument|trip", m.TestedAt, new Settler.TraceableInstrument(TestKind.Trip));
            return;
        }

        ledger.Raise("instrument|trip", untraced with { Facts = new InstrumentFacts.SessionUntraced(TestKind.Trip, m.TestedAt.Date, trace) });
    }

    /// <summary>The latest tripped as-found test at each point with its band position, for the peer comparison.</summary>
    public static IEnumerable<(TripPoint Point, JudgedTrip Latest, double Position)> Positions(IReadOnlyList<JudgedTrip> trips) =>
        Positions(ByPoint(trips));

    /// <summary>As <see cref="Positions(IReadOnlyList{JudgedTrip})"/>, from tests already grouped by point.</summary>
    public static IEnumerable<(TripPoint Point, JudgedTrip Latest, double Position)> Positions(IReadOnlyList<(TripPoint Point, List<JudgedTrip> Tests)> points) =>
        points.Select(g => (g.Point, Latest: g.Tests[^1]))
            .Where(x => x.Latest.Assessment.Margin.PositionInBand is not null)
            .Select(x => (x.Point, x.Latest, x.Latest.Assessment.Margin.PositionInBand!.Value));

    /// <summary>
    /// The tests at one point since the settings last changed: a register revision (or settings found on the device)
    /// that changes the protection settings moves the expected trip time, so it starts a new baseline and a new trend,
    /// as a repair does for contact resistance.
    /// </summary>
    public static List<JudgedTrip> SinceSettingsChanged(List<JudgedTrip> tests)
    {
        var from = 0;
        for (var i = 1; i < tests.Count; i++)
        {
            if (!Equals(tests[i].Device.Settings, tests[i - 1].Device.Settings))
            {
                from = i;
            }
        }

        return from == 0 ? tests : tests[from..];
    }

    /// <summary>
    /// trip-drift: the latest as-found time at each point against the first since the settings last changed. Judged
    /// only where the band gives room to drift (both edges known, so a place in the band exists): an instantaneous
    /// trip's few milliseconds under an open-ended band are no drift. Two tests, either of which fires: the slower of the
    /// two times over the faster (a factor, the same either way on a log scale) against 1 + trip_drift_time_percent, and
    /// the move of the place in the band against trip_drift_band_percent of the band. The finding carries, and its text
    /// prints, the one that fired.
    /// </summary>
    public static void Drift(IReadOnlyList<(TripPoint Point, List<JudgedTrip> Tests)> points, FindingLedger ledger, FindingPolicy policy)
    {
        foreach (var (point, all) in points)
        {
            var tests = SinceSettingsChanged(all);
            var (first, last) = (tests[0], tests[^1]);
            if (last.Trip.Measurement.TestedAt.Date <= first.Trip.Measurement.TestedAt.Date)
            {
                continue;
            }

            var (p0, p1) = (first.Assessment.Margin.PositionInBand, last.Assessment.Margin.PositionInBand);
            var drift = TripDrift.Between(first.Trip.Measurement.Outcome.Time, p0, last.Trip.Measurement.Outcome.Time, p1);
            if (drift.PositionShift is not { } shift)
            {
                continue;
            }

            // The rule compares a factor: 10^|decades| against 1 + limit/100, so a halving and a doubling weigh the same.
            var factorPercent = 100 * (Math.Pow(10, Math.Abs(drift.Decades)) - 1);
            var byTime = factorPercent >= policy.TripDriftTimePercent - Tolerance;
            var byBand = Math.Abs(shift) * 100 >= policy.TripDriftBandPercent - Tolerance;
            if (!byTime && !byBand)
            {
                continue;
            }

            var m = last.Trip.Measurement;
            var from = first.Trip.Measurement;
            var facts = new TripFacts.Drift(point.Label, from.Outcome.Time, from.TestedAt.Date, m.Outcome.Time, m.TestedAt.Date,
                tests.Count < all.Count ? from.TestedAt.Date : null, byTime, drift.Decades >= 0, Math.Pow(10, Math.Abs(drift.Decades)),
                policy.TripDriftTimePercent, shift, p0!.Value, p1!.Value, policy.TripDriftBandPercent);
            ledger.Add(new Finding(FindingKind.TripDrift, Severity.Investigate, m.Tag, m.TestedAt, facts, [Source(first), Source(last)])
            {
                Point = point.Label,
                Value = byTime ? new Reading(factorPercent, ReadingUnit.Percent) : new Reading(shift * 100, ReadingUnit.Percent),
                Limit = new Reading(byTime ? policy.TripDriftTimePercent : policy.TripDriftBandPercent, ReadingUnit.Percent),
                Policy = byTime ? PolicyFile.Setting(policy, "trip_drift_time_percent") : PolicyFile.Setting(policy, "trip_drift_band_percent"),
                FirstSeen = first.Trip.Measurement.TestedAt.Date,
            });
        }
    }

    /// <summary>
    /// trip-trend-exit: a Theil–Sen line through log trip time since the settings last changed reaches a guaranteed edge
    /// before <paramref name="window"/> (the due date before any forecast). The text names <paramref name="due"/>, the
    /// device's one due date; a forecast date before <paramref name="asOf"/> says it has probably left the band already.
    /// </summary>
    public static void TrendExit(IReadOnlyList<(TripPoint Point, List<JudgedTrip> Tests)> points, FindingLedger ledger, FindingPolicy policy,
        DateOnly window, DateOnly due, DateOnly asOf)
    {
        foreach (var (point, all) in points)
        {
            var since = SinceSettingsChanged(all);
            var tests = UntraceableInTrend.Kept(since, Traceable, policy);
            var untraceable = since.Count(t => !Traceable(t));
            if (tests.Count == 0)
            {
                continue;
            }

            var last = tests[^1];
            var dates = tests.Select(t => t.Trip.Measurement.TestedAt.Date).Distinct().Count();
            if (dates < policy.TrendMinimumTests || last.Assessment.Verdict != Verdict.Pass)
            {
                continue;
            }

            var line = TheilSen.Fit(tests.Select(t => new TrendPoint(TrendPoint.YearOf(t.Trip.Measurement.TestedAt.Date), Math.Log10(t.Trip.Measurement.Outcome.Time.Value))).ToList());
            var band = last.Assessment.Band;
            if (line is null || line.Slope == 0)
            {
                continue;
            }

            var edge = line.Slope > 0 ? band.Maximum : band.Minimum;
            if (edge.Limit is not { Value: > 0 } limit)
            {
                continue;
            }

            var exit = line.Reaches(Math.Log10(limit.Value));
            var until = Math.Min(TrendPoint.YearOf(window), line.LastYear + policy.ForecastHorizonYears);
            if (exit is not { } year || year > until)
            {
                continue;
            }

            var width = band.Minimum.Limit is { Value: > 0 } min && band.Maximum.Limit is { } max ? Math.Log10(max.Value / min.Value) : (double?)null;
            var uncertain = width is { } w && line.Spread > w * policy.TripTrendScatterBandPercent / 100;
            var on = TrendPoint.DateOf(year);
            var m = last.Trip.Measurement;
            ledger.Add(new Finding(FindingKind.TripTrendExit, uncertain ? Severity.Investigate : Severity.Plan, m.Tag, m.TestedAt,
                new TripFacts.TrendExit(point.Label, line.Count, edge.Requirement, line.Slope > 0, limit, new ForecastDates(on, due, asOf), uncertain,
                    UntraceableInTrend.Share(untraceable, tests.Count, policy)),
                [.. tests.Select(Source)])
            {
                Point = point.Label,
                Value = new Reading(m.Outcome.Time.Value, ReadingUnit.Seconds),
                Limit = new Reading(limit.Value, ReadingUnit.Seconds),
                Policy = $"{PolicyFile.Setting(policy, "trend_min_tests")}; {PolicyFile.Setting(policy, "trip_trend_scatter_band_percent")}",
                ForecastOn = on,
                Trend = line,
                UntraceableReadings = untraceable == 0 ? null : untraceable,
            });
        }
    }

    /// <summary>Whether the test's instrument was traceable on the day: the judge raised no instrument finding on it.</summary>
    public static bool Traceable(JudgedTrip judged) =>
        !judged.Findings.Any(f => f.Kind is FindingKind.CalibrationLapsed or FindingKind.InstrumentUnregistered);

    /// <summary>The device's comparable tests grouped by point (<see cref="TripPoint.Series"/>).</summary>
    public static IReadOnlyList<(TripPoint Point, List<JudgedTrip> Tests)> ByPoint(IReadOnlyList<JudgedTrip> trips) => TripPoint.Series(trips);

    internal static RecordSource Source(JudgedTrip judged) => new(judged.Trip.SourceFile, judged.Trip.SourceLine);

    // Thresholds are compared at a stated precision, 1e-9 of a per cent, so a value exactly at a limit that arrives a
    // rounding error away from it (a ratio of corrected readings, a logarithm) is judged as exactly at it.
    internal const double Tolerance = 1e-9;
}
