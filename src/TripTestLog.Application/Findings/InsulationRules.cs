using TripTestLog.Domain.Quantities;
using TripTestLog.Application.Check;
using TripTestLog.Domain.Codes;
using TripTestLog.Domain.Condition;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Trends;

namespace TripTestLog.Application.Findings;

/// <summary>
/// The findings a device's insulation readings raise. Each reading is referred to 20 °C by the lab policy's rule
/// (<see cref="FindingPolicy.InsulationCorrection"/>) where a temperature is recorded; an over-range reading ('&gt;') counts as at least its value, so it never falls below a minimum.
/// </summary>
internal static class InsulationRules
{
    internal sealed record PathResult(AssetTag Tag, string Path, TestedAt At, TestStage Stage, double Corrected, double Measured, bool OverRange,
        double? Celsius, double TestVoltage, RecordSource Source, string Instrument, bool Traceable)
    {
        /// <summary>Whether a temperature was recorded, so the reading was referred to 20 °C.</summary>
        public bool TemperatureKnown => Celsius is not null;
    }

    /// <summary>insulation-below-minimum, the test voltage and the tester's calibration, test by test.</summary>
    public static void States(DeviceHistory history, IReadOnlyList<StoredMeasurement<InsulationMeasurement>> readings, FindingLedger ledger, FindingPolicy policy,
        Domain.Instruments.InstrumentRegister instruments)
    {
        var sessionAt = (TestedAt?)null;
        // In the order stored within a test (not by path), so which of equal findings is named first does not move.
        var results = readings.Select(r => Result(r, policy, instruments)).OrderBy(r => r.At).ThenBy(r => r.Stage).ToList();
        foreach (var r in results)
        {
            if (r.Stage == TestStage.AsFound && sessionAt != r.At)
            {
                sessionAt = r.At;
                var session = results.Where(x => x.At == r.At && x.Stage == TestStage.AsFound).ToList();
                SessionInstrument.Judge(TestKind.Insulation, session[0].Tag, session[0].At, [.. session.Select(p => (p.Instrument, (IEnumerable<RecordSource>)[p.Source]))], ledger, policy, instruments);
            }

            var device = history.InForceOn(r.At.Date);
            if (InsulationMinimum.For(policy.InsulationTable, device.RatedVoltage) is not { } row)
            {
                continue;
            }

            Voltage(r, row, device, ledger, policy);
            // The decision rule: the tester's stated accuracy on the day, else the lab policy's default.
            var accuracy = policy.Decision.AccuracyOf(instruments, r.Instrument, r.At.Date);
            var expanded = accuracy.CoverageFactor * accuracy.InsulationStandard(r.Corrected);
            var guard = Uncertain.Guard(policy, expanded);
            var within = policy.DecisionRule != Domain.Verdicts.DecisionRule.Simple && !r.OverRange && Math.Abs(r.Corrected - row.Minimum.Value) < guard;
            var below = !r.OverRange && (policy.DecisionRule == Domain.Verdicts.DecisionRule.Guarded ? r.Corrected < row.Minimum.Value - guard : r.Corrected < row.Minimum.Value);
            Uncertain.Settle(ledger, "accuracy|insulation|" + r.Path, within, r.Stage == TestStage.AsFound, r.At, () => new Finding(FindingKind.RetestAccuracy, Severity.Investigate,
                r.Tag, r.At, new InsulationFacts.WithinUncertainty(r.Path, r.Corrected, row.Minimum.Value, guard, expanded, accuracy, policy.DecisionRule),
                [r.Source])
            {
                Path = r.Path,
                Value = new Reading(r.Corrected, ReadingUnit.MegaOhms),
                Limit = new Reading(row.Minimum.Value, ReadingUnit.MegaOhms),
                Policy = PolicyFile.Setting(policy, "decision_rule"),
                Measured = MeasuredOf(r),
                Correction = CorrectionOf(r, policy),
            });
            if (within && !below && policy.DecisionRule == Domain.Verdicts.DecisionRule.Guarded)
            {
                continue;
            }

            var subject = "insulation|" + r.Path;
            if (below)
            {
                ledger.Raise(subject, new Finding(FindingKind.InsulationBelowMinimum, Severity.Act, r.Tag, r.At,
                    new InsulationFacts.BelowMinimum(row.Source, r.Stage, r.Path, ReadingOf(r, policy), row.Minimum.Value, device.RatedVoltage.Value,
                        r.TestVoltage, row.TestVoltage.Value),
                    [r.Source])
                {
                    Path = r.Path,
                    Value = new Reading(r.Corrected, ReadingUnit.MegaOhms),
                    Limit = new Reading(row.Minimum.Value, ReadingUnit.MegaOhms),
                    Policy = PolicyFile.Setting(policy, "insulation_table"),
                    Measured = MeasuredOf(r),
                    Correction = CorrectionOf(r, policy),
                });
            }
            else if (r.Stage == TestStage.AsFound)
            {
                ledger.Clear(subject, r.At, new Settler.PathAboveMinimum(r.Path));
            }
            else
            {
                ledger.Confirm(subject, r.At, new Settler.PathAboveMinimum(r.Path));
            }
        }
    }

    // insulation-test-voltage: a reading at a lower voltage than the table's says little about the insulation at the
    // voltage the table's minimum assumes, whatever it reads: retest at the table's voltage. A later as-found test of the
    // path at that voltage closes it.
    private static void Voltage(PathResult r, InsulationMinimum row, Device device, FindingLedger ledger, FindingPolicy policy)
    {
        var subject = "voltage|" + r.Path;
        if (r.TestVoltage < row.TestVoltage.Value)
        {
            ledger.Raise(subject, new Finding(FindingKind.InsulationTestVoltage, Severity.Investigate, r.Tag, r.At,
                new InsulationFacts.TestVoltage(row.Source, r.Stage, r.Path, ReadingOf(r, policy), device.RatedVoltage.Value, r.TestVoltage, row.TestVoltage.Value),
                [r.Source])
            {
                Path = r.Path,
                Value = new Reading(r.TestVoltage, ReadingUnit.Volts),
                Limit = new Reading(row.TestVoltage.Value, ReadingUnit.Volts),
                Policy = PolicyFile.Setting(policy, "insulation_table"),
            });
        }
        else if (r.Stage == TestStage.AsFound)
        {
            ledger.Clear(subject, r.At, new Settler.PathAtVoltage(r.Path, r.TestVoltage));
        }
        else
        {
            ledger.Confirm(subject, r.At, new Settler.PathAtVoltage(r.Path, r.TestVoltage));
        }
    }

    /// <summary>insulation-falling: a Theil–Sen line through a path's log readings falls faster than the policy allows, clearly beyond their scatter.</summary>
    public static void Falling(DeviceHistory history, IReadOnlyList<StoredMeasurement<InsulationMeasurement>> readings, FindingLedger ledger, FindingPolicy policy,
        Domain.Instruments.InstrumentRegister instruments, DateOnly asOf)
    {
        foreach (var path in Results(readings, policy, instruments).Where(r => r.Stage == TestStage.AsFound).GroupBy(r => r.Path))
        {
            var all = path.OrderBy(r => r.At).ToList();
            var list = UntraceableInTrend.Kept(all, r => r.Traceable, policy);
            var untraceable = all.Count(r => !r.Traceable);
            if (list.Select(r => r.At.Date).Distinct().Count() < policy.TrendMinimumTests)
            {
                continue;
            }

            var line = TheilSen.Fit([.. list.Select(r => new TrendPoint(TrendPoint.YearOf(r.At.Date), Math.Log10(r.Corrected)))]);
            if (line is null || line.Slope >= 0)
            {
                continue;
            }

            var fall = 100 * (1 - Math.Pow(10, line.Slope));
            var span = line.LastYear - TrendPoint.YearOf(list[0].At.Date);

            // The fall over the span must stand clear of the scatter: twice the robust spread, so noise does not read as a trend.
            if (fall < policy.InsulationFallPercentPerYear || -line.Slope * span < 2 * line.Spread)
            {
                continue;
            }

            var last = list[^1];
            var row = InsulationMinimum.For(policy.InsulationTable, history.InForceOn(last.At.Date).RatedVoltage);
            var reach = row is null ? null : line.Reaches(Math.Log10(row.Minimum.Value));
            var forecast = reach is { } year && year <= line.LastYear + policy.ForecastHorizonYears ? TrendPoint.DateOf(year) : (DateOnly?)null;
            ledger.Add(new Finding(FindingKind.InsulationFalling, Severity.Plan, last.Tag, last.At,
                new InsulationFacts.Falling(last.Path, line.Count, policy.InsulationCorrection, fall, list[0].Corrected, list[0].At.Date, last.Corrected,
                    forecast is null ? null : row!.Minimum.Value, forecast, asOf, UntraceableInTrend.Share(untraceable, list.Count, policy)),
                [.. list.Select(r => r.Source)])
            {
                Path = last.Path,
                Value = new Reading(fall, ReadingUnit.Percent),
                Limit = new Reading(policy.InsulationFallPercentPerYear, ReadingUnit.Percent),
                Policy = PolicyFile.Setting(policy, "insulation_fall_percent_per_year"),
                ForecastOn = forecast,
                Trend = line,

                // The value is a rate, so no reading as measured stands beside it; the rule names how the line's readings were referred.
                Correction = Setting(policy),
                UntraceableReadings = untraceable == 0 ? null : untraceable,
            });
        }
    }

    /// <summary>Every reading referred to 20 °C under the lab policy, in time order (as-found before as-left on a day).</summary>
    public static IEnumerable<PathResult> Results(IReadOnlyList<StoredMeasurement<InsulationMeasurement>> readings, FindingPolicy policy,
        Domain.Instruments.InstrumentRegister instruments) =>
        readings.Select(r => Result(r, policy, instruments)).OrderBy(r => r.At).ThenBy(r => r.Stage).ThenBy(r => r.Path, StringComparer.Ordinal);

    /// <summary>The policy setting that names the correction rule: "insulation_correction = halving-10k".</summary>
    public static string Setting(FindingPolicy policy) => PolicyFile.Setting(policy, "insulation_correction");

    private static PathResult Result(StoredMeasurement<InsulationMeasurement> stored, FindingPolicy policy, Domain.Instruments.InstrumentRegister instruments)
    {
        var m = stored.Measurement;
        var corrected = m.Temperature is { } t
            ? InsulationCorrection.ToTwentyCelsius(m.Resistance.Value, t, policy.InsulationCorrection).Value
            : m.Resistance.Value.Value;
        return new PathResult(m.Tag, m.Path, m.TestedAt, m.Stage, corrected, m.Resistance.Value.Value, m.Resistance.OverRange, m.Temperature?.Value,
            m.TestVoltage.Value, new RecordSource(stored.SourceFile, stored.SourceLine), m.Instrument,
            UntraceableInTrend.Traceable(instruments, policy, m.Instrument, m.TestedAt.Date));
    }

    private static Reading MeasuredOf(PathResult r) => new(r.Measured, ReadingUnit.MegaOhms);

    // A reading with no temperature is not corrected, so no rule applies to it.
    private static string? CorrectionOf(PathResult r, FindingPolicy policy) => r.TemperatureKnown ? Setting(policy) : null;

    private static InsulationFacts.PathReading ReadingOf(PathResult r, FindingPolicy policy) => new(r.Corrected, r.Measured, r.Celsius, policy.InsulationCorrection);
}
