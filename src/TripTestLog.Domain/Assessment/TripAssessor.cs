using System.Globalization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Assessment;

/// <summary>
/// Judges a trip test the way a lab would: with the register entry in force on the test date, the settings found on
/// the device when the record carries them (they win), the poles loaded, the ambient correction when the device has
/// one, and three checks that a failure is not the test's own doing. A verdict that would change under a start the
/// records leave in doubt, under the ambient shift a thermal release may have without a derating table, or (on an RCBO
/// loaded on one pole) by the residual-current release, is not assessable, and the reason says why.
/// </summary>
/// <param name="curveTables">Curve tables by name.</param>
/// <param name="ambientTables">Ambient tables by name.</param>
/// <param name="ambientNoteKelvin">How far from the reference ambient a thermal verdict carries a note, in kelvin.</param>
/// <param name="pointWindow">The lab's test-current tolerance within which a test is a test of a standard's point.</param>
/// <param name="decision">The lab's decision rule and default accuracies (default: simple acceptance).</param>
/// <param name="instruments">The instrument register the accuracy of each test's instrument is read from.</param>
public sealed partial class TripAssessor(IReadOnlyDictionary<string, CurveTable> curveTables, IReadOnlyDictionary<string, AmbientTable> ambientTables,
    double ambientNoteKelvin = LabPolicy.AmbientNoteKelvin, double pointWindow = LabPolicy.PointWindow, DecisionPolicy? decision = null,
    Instruments.InstrumentRegister? instruments = null)
{
    private readonly DecisionPolicy _decision = decision ?? DecisionPolicy.Default;
    private readonly Instruments.InstrumentRegister _instruments = instruments ?? Instruments.InstrumentRegister.Empty;

    private readonly Dictionary<(Device, DeviceSettings, double, AmbientShift), ITripEnvelope> _envelopes = [];

    // The family's envelope does not depend on the ambient's shift, which differs from test to test: built once a setting.
    private readonly Dictionary<(Device, DeviceSettings, double), ITripEnvelope> _families = [];

    /// <summary>The result of judging one test: the envelope used and the assessment.</summary>
    /// <param name="Device">The register entry in force on the test date.</param>
    /// <param name="Envelope">The envelope the test was judged against.</param>
    /// <param name="Assessment">Verdict, basis, margin, reason and notes.</param>
    public sealed record Result(Device Device, ITripEnvelope Envelope, TripAssessment Assessment);

    /// <summary>
    /// Judges <paramref name="measurement"/> for the device whose entries are <paramref name="history"/>;
    /// <paramref name="previous"/> is the device's test just before it, which checks the test's start claim.
    /// </summary>
    public Result Assess(DeviceHistory history, TripMeasurement measurement, TripMeasurement? previous = null)
    {
        var (device, settings, envelope, thermal, notes) = Prepare(history, measurement);
        var conditions = TestConditions.Of(measurement, device.Poles);
        var assessment = TripJudge.Assess(envelope, measurement, conditions);
        assessment = CheckStart(assessment, envelope, previous, conditions)
            ?? CheckCurveTableAmbient(assessment, device, settings, thermal, envelope, conditions)
            ?? CheckResidual(assessment, device, conditions)
            ?? assessment;

        // The decision rule comes last: it weighs the verdict the checks left against the instrument's accuracy.
        var accuracy = _decision.AccuracyOf(_instruments, measurement.Instrument, measurement.TestedAt.Date);
        assessment = TripJudge.ApplyRule(assessment, envelope, conditions, accuracy, _decision.Rule, _decision.GuardBandFactor);
        return new Result(device, envelope, assessment with { Notes = [.. notes, .. assessment.Notes] });
    }

    /// <summary>
    /// The envelope <see cref="Assess"/> would judge <paramref name="measurement"/> against (the register entry in
    /// force, settings found on the device, the ambient correction), without judging it, and that entry.
    /// </summary>
    public (Device Device, ITripEnvelope Envelope) EnvelopeOf(DeviceHistory history, TripMeasurement measurement)
    {
        var prepared = Prepare(history, measurement);
        return (prepared.Device, prepared.Envelope);
    }

    private (Device Device, DeviceSettings Settings, ITripEnvelope Envelope, bool Thermal, List<string> Notes) Prepare(DeviceHistory history, TripMeasurement measurement)
    {
        ArgumentNullException.ThrowIfNull(history);
        ArgumentNullException.ThrowIfNull(measurement);
        var device = history.InForceOn(measurement.TestedAt.Date);
        var notes = new List<string>();
        var settings = device.Settings;
        if (measurement.FoundSettings is { IsEmpty: false } found)
        {
            (settings, var settingNotes) = found.ApplyTo(device.Settings);
            notes.AddRange(settingNotes);
        }

        var uncorrected = Envelope(device, settings, 1.0, AmbientShift.None);
        var factor = 1.0;
        var thermal = uncorrected.IsThermal(measurement.Current);
        if (thermal && measurement.Ambient is { } ambient && device.AmbientTable is not null)
        {
            (factor, var ambientNote) = TableFactor(device, ambient);
            notes.Add(ambientNote);
        }

        // Without a derating table the ambient moves the thermal points' limits by what it can do, in the test's favour.
        var shift = AmbientShift.None;
        if (thermal && factor == 1.0 && AmbientDelta(device, settings, measurement) is { } d && Math.Abs(d.Kelvin) > LabPolicy.AmbientCheckKelvin)
        {
            shift = AmbientShift.For(d.Kelvin, LabPolicy.AmbientShiftPerKelvin, d.Ambient.ToString(), d.Reference.ToString());
            if (Math.Abs(d.Kelvin) > ambientNoteKelvin)
            {
                notes.Add($"ambient {d.Ambient} is {Math.Abs(d.Kelvin):0.#} K from the {d.Reference} reference and the device has no derating table; "
                    + $"the thermal limits were moved by up to {LabPolicy.AmbientShiftPerKelvin * 100:0.#} % of current per K (from memory), in the test's favour");
            }
        }

        return (device, settings, Envelope(device, settings, factor, shift), thermal, notes);
    }

    private (double Factor, string Note) TableFactor(Device device, Quantities.Celsius ambient)
    {
        var name = device.AmbientTable!;
        if (!ambientTables.TryGetValue(name, out var table))
        {
            return (1.0, $"ambient table '{name}' has not been imported; no ambient correction applied");
        }

        return table.FactorAt(ambient) is { } f
            ? (f, $"ambient {ambient}: thermal limits corrected by x{f.ToString("0.###", CultureInfo.InvariantCulture)} from ambient table {name}")
            : (1.0, $"ambient {ambient} is outside ambient table {name}; no correction applied");
    }

    private ITripEnvelope Envelope(Device device, DeviceSettings settings, double factor, AmbientShift shift)
    {
        if (!_envelopes.TryGetValue((device, settings, factor, shift), out var envelope))
        {
            if (!_families.TryGetValue((device, settings, factor), out var family))
            {
                family = EnvelopeFactory.For(device, settings, factor, curveTables);
                _families[(device, settings, factor)] = family;
            }

            envelope = PointWindowEnvelope.Of(family, pointWindow, shift);
            _envelopes[(device, settings, factor, shift)] = envelope;
        }

        return envelope;
    }

    // The ambient's distance from the thermal release's reference, where it can move a bimetal release: not an
    // electronic unit or a relay (they time from the measured current), and not where a derating table corrects it.
    private static (double Kelvin, Quantities.Celsius Ambient, Quantities.Celsius Reference)? AmbientDelta(Device device, DeviceSettings settings, TripMeasurement m)
    {
        var reference = device.ReferenceAmbient ?? EnvelopeFactory.DefaultReferenceAmbient(device.Family);
        if (settings is ElectronicTripSettings or RelaySettings || device.AmbientTable is not null || m.Ambient is not { } ambient || reference is not { } r
            || ambient.Value == r.Value)
        {
            return null;
        }

        return (ambient.Value - r.Value, ambient, r);
    }

    // A verdict changes in kind when it turns into, or out of, a failure, or from one failure into the other.
    private static bool Changes(Verdict a, Verdict b) =>
        a != b && (a is Verdict.TooEarly or Verdict.TooLate || b is Verdict.TooEarly or Verdict.TooLate);

    private static string Word(Verdict v) => v switch
    {
        Verdict.Pass => "pass",
        Verdict.TooEarly => "too early",
        Verdict.TooLate => "too late",
        _ => "not assessable",
    };
}
