using System.Globalization;
using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Envelopes;
using TripTestLog.Domain.Measurements;
using TripTestLog.Domain.Settings;
using TripTestLog.Domain.Verdicts;

namespace TripTestLog.Domain.Assessment;

/// <summary>
/// Judges a trip test the way a lab would: with the register entry in force on the test date, the settings found on
/// the device when the record carries them (they win), the ambient correction when the device has one, and a note on
/// thermal verdicts taken far from the reference ambient without one.
/// </summary>
public sealed class TripAssessor(IReadOnlyDictionary<string, CurveTable> curveTables, IReadOnlyDictionary<string, AmbientTable> ambientTables)
{
    /// <summary>
    /// How far, in kelvin, the test ambient may lie from the reference ambient before an uncorrected thermal verdict is
    /// marked: 15 K. A lab policy chosen for this tool, so that tests in an ordinary indoor 15 °C to 45 °C pass unmarked
    /// against a 30 °C reference (thermal releases shift a few per cent in current per 10 K); not a figure from a standard.
    /// </summary>
    public const double AmbientFlagKelvin = 15.0;

    private readonly Dictionary<(Device, DeviceSettings, double), ITripEnvelope> _envelopes = [];

    /// <summary>The result of judging one test: the envelope used and the assessment.</summary>
    /// <param name="Device">The register entry in force on the test date.</param>
    /// <param name="Envelope">The envelope the test was judged against.</param>
    /// <param name="Assessment">Verdict, basis, margin, reason and notes.</param>
    public sealed record Result(Device Device, ITripEnvelope Envelope, TripAssessment Assessment);

    /// <summary>Judges <paramref name="measurement"/> for the device whose entries are <paramref name="history"/>.</summary>
    public Result Assess(DeviceHistory history, TripMeasurement measurement)
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

        var uncorrected = Envelope(device, settings, 1.0);
        var factor = 1.0;
        if (uncorrected.IsThermal(measurement.Current) && measurement.Ambient is { } ambient)
        {
            (factor, var ambientNote) = Ambient(device, ambient);
            if (ambientNote is not null)
            {
                notes.Add(ambientNote);
            }
        }

        var envelope = factor == 1.0 ? uncorrected : Envelope(device, settings, factor);
        var assessment = TripJudge.Assess(envelope, measurement) with { Notes = notes };
        return new Result(device, envelope, assessment);
    }

    private (double Factor, string? Note) Ambient(Device device, Quantities.Celsius ambient)
    {
        var reference = device.ReferenceAmbient ?? EnvelopeFactory.DefaultReferenceAmbient(device.Family);
        if (device.AmbientTable is { } name)
        {
            if (!ambientTables.TryGetValue(name, out var table))
            {
                return (1.0, $"ambient table '{name}' has not been imported; no ambient correction applied");
            }

            if (table.FactorAt(ambient) is { } f)
            {
                return (f, $"ambient {ambient}: thermal limits corrected by x{f.ToString("0.###", CultureInfo.InvariantCulture)} from ambient table {name}");
            }

            return (1.0, $"ambient {ambient} is outside ambient table {name}; no correction applied");
        }

        if (reference is { } r && Math.Abs(ambient.Value - r.Value) > AmbientFlagKelvin)
        {
            return (1.0, $"ambient {ambient} is {Math.Abs(ambient.Value - r.Value):0.#} K from the {r} reference and the device has no ambient table; "
                + "a thermal trip time may be shifted by that alone");
        }

        return (1.0, null);
    }

    private ITripEnvelope Envelope(Device device, DeviceSettings settings, double factor)
    {
        if (!_envelopes.TryGetValue((device, settings, factor), out var envelope))
        {
            envelope = EnvelopeFactory.For(device, settings, factor, curveTables);
            _envelopes[(device, settings, factor)] = envelope;
        }

        return envelope;
    }
}
