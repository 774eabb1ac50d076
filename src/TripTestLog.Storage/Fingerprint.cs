using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using TripTestLog.Domain.Instruments;
using TripTestLog.Domain.Measurements;

namespace TripTestLog.Storage;

/// <summary>
/// A content hash of a measurement, over every field as stored. Two rows with the same fingerprint are the same
/// measurement, whichever file they came in.
/// </summary>
internal static class Fingerprint
{
    public static string Of(TripMeasurement m, long deviceId)
    {
        object[] parts =
        [
            "trip", deviceId, m.TestedAt, m.Stage, m.Pole, R(m.Current.Value), m.Outcome.Tripped, R(m.Outcome.Time.Value), m.Start,
            m.Ambient is { } a ? R(a.Value) : "", m.Instrument, m.Technician, m.Note,
        ];
        return Hash(m.FoundSettings is null ? parts : [.. parts, Found(m)]);
    }

    public static string Of(ContactMeasurement m, long deviceId) => Hash(
        "contact", deviceId, m.TestedAt, m.Stage, m.Pole, R(m.Resistance.Value), R(m.TestCurrent.Value),
        m.Temperature is { } t ? R(t.Value) : "", m.Instrument, m.Technician);

    public static string Of(InsulationMeasurement m, long deviceId) => Hash(
        "insulation", deviceId, m.TestedAt, m.Stage, m.Path, R(m.TestVoltage.Value), R(m.Resistance.Value.Value), m.Resistance.OverRange,
        m.Temperature is { } t ? R(t.Value) : "", m.Duration is { } d ? R(d.Value) : "");

    public static string Of(InstrumentCalibration c) => Hash("instrument", c.Instrument, c.Kind, c.Serial, c.CalibratedOn, c.CalibrationDue);

    // Rows without settings hash as they did before settings could be recorded, so older fingerprints stay valid.
    private static string Found(TripMeasurement m) => m.FoundSettings is not { } f ? "" :
        string.Join('/', R(f.Ir?.Value), R(f.Isd?.Value), R(f.Ii?.Value), R(f.Im?.Value), R(f.Pickup?.Value), R(f.Tms));

    private static string R(double? value) => value is { } v ? R(v) : "";

    // Round-trip formatting keeps 0.1 and 0.10000000000000001 apart only where the doubles really differ.
    private static string R(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static string Hash(params object[] parts)
    {
        var text = string.Join('\u001f', parts.Select(p => Convert.ToString(p, CultureInfo.InvariantCulture)));
        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)))[..32];
    }
}
