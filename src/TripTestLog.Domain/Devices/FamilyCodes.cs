namespace TripTestLog.Domain.Devices;

/// <summary>The words record files, the store and the command line use for device families.</summary>
public static class FamilyCodes
{
    private static readonly IReadOnlyDictionary<DeviceFamily, string> Codes = new Dictionary<DeviceFamily, string>
    {
        [DeviceFamily.Iec60898] = "iec60898",
        [DeviceFamily.Iec60947Electronic] = "iec60947-electronic",
        [DeviceFamily.Iec60947ThermalMagnetic] = "iec60947-thermal-magnetic",
        [DeviceFamily.RelayIdmt] = "relay-idmt",
        [DeviceFamily.CurveTable] = "curve-table",
        [DeviceFamily.Iec61009] = "iec61009",
    };

    /// <summary>Every code, in declaration order.</summary>
    public static IEnumerable<string> All => Codes.Values;

    /// <summary>The code of a family.</summary>
    public static string Of(DeviceFamily family) => Codes[family];

    /// <summary>Reads a code (case-insensitive); false when unknown.</summary>
    public static bool TryParse(string text, out DeviceFamily family)
    {
        var match = Codes.FirstOrDefault(kv => string.Equals(kv.Value, text.Trim(), StringComparison.OrdinalIgnoreCase));
        family = match.Key;
        return match.Value is not null;
    }
}
