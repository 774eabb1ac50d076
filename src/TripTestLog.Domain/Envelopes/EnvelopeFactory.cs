using TripTestLog.Domain.Devices;
using TripTestLog.Domain.Quantities;
using TripTestLog.Domain.Settings;

namespace TripTestLog.Domain.Envelopes;

/// <summary>Builds the envelope a device's trip tests are judged against, from its family, ratings and settings.</summary>
public static class EnvelopeFactory
{
    /// <summary>
    /// The envelope for <paramref name="device"/> with <paramref name="settings"/> (the register's, or those found at the
    /// test); <paramref name="thermalFactor"/> is the ambient correction on thermal currents. A curve table the device
    /// names is looked up in <paramref name="curveTables"/>; a missing one gives an <see cref="UnavailableEnvelope"/>.
    /// </summary>
    public static ITripEnvelope For(Device device, DeviceSettings settings, double thermalFactor, IReadOnlyDictionary<string, CurveTable> curveTables)
    {
        ArgumentNullException.ThrowIfNull(device);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(curveTables);
        ITripEnvelope family = settings switch
        {
            Iec60898Settings s => new Iec60898Envelope(s.Curve, device.RatedCurrent, thermalFactor, device.Poles, s.Supply, device.Family == DeviceFamily.Iec61009),
            ElectronicTripSettings s => new ElectronicTripEnvelope(device.RatedCurrent, s, thermalFactor),
            ThermalMagneticSettings s => new ThermalMagneticEnvelope(device.RatedCurrent, s, thermalFactor),
            RelaySettings s => new RelayEnvelope(s),
            CurveTableSettings s => curveTables.TryGetValue(s.Table, out var own)
                ? new CurveTableEnvelope(own, device.RatedCurrent, thermalFactor)
                : Missing(device, s.Table),
            _ => throw new ArgumentOutOfRangeException(nameof(settings), settings.GetType().Name, "no envelope for these settings"),
        };

        if (device.CurveTable is not { } name || settings is CurveTableSettings)
        {
            return family;
        }

        return curveTables.TryGetValue(name, out var table)
            ? new OverlayEnvelope(new CurveTableEnvelope(table, family.Reference, thermalFactor), family)
            : Missing(device, name);
    }

    /// <summary>The envelope with the register's own settings and no ambient correction.</summary>
    public static ITripEnvelope For(Device device) =>
        For(device, device.Settings, 1.0, new Dictionary<string, CurveTable>());

    private static UnavailableEnvelope Missing(Device device, string table) =>
        new($"curve table {table}", device.RatedCurrent,
            $"curve table '{table}' named in the register for {device.Tag} has not been imported; import it to judge this device");

    /// <summary>The ambient the family's thermal release is calibrated at when the register gives none.</summary>
    public static Celsius? DefaultReferenceAmbient(DeviceFamily family) => family switch
    {
        DeviceFamily.Iec60898 or DeviceFamily.Iec61009 => Iec60898Envelope.ReferenceAmbient,

        // IEC 60947-2 leaves the reference to the maker; 40 °C is the value most makers state (common practice).
        DeviceFamily.Iec60947Electronic or DeviceFamily.Iec60947ThermalMagnetic => Celsius.Of(40),
        _ => null,
    };
}
