using TripTestLog.Domain.Codes;

namespace TripTestLog.Domain.Devices;

/// <summary>The words record files, the store and the command line use for device families (see <see cref="TextCodes.Family"/>).</summary>
public static class FamilyCodes
{
    /// <summary>Every code, in declaration order.</summary>
    public static IEnumerable<string> All => TextCodes.Family.All;

    /// <summary>The code of a family.</summary>
    public static string Of(DeviceFamily family) => TextCodes.Family.Of(family);

    /// <summary>Reads a code (case-insensitive); false when unknown.</summary>
    public static bool TryParse(string text, out DeviceFamily family) => TextCodes.Family.TryParse(text, out family);
}
