using TripTestLog.Domain.Codes;

namespace TripTestLog.Domain.Settings;

/// <summary>The words record files and the command line use for IDMT curves (see <see cref="TextCodes.IdmtCurve"/>).</summary>
public static class CurveCodes
{
    /// <summary>Every code, in declaration order.</summary>
    public static IEnumerable<string> All => TextCodes.IdmtCurve.All;

    /// <summary>The code of a curve.</summary>
    public static string Of(IdmtCurve curve) => TextCodes.IdmtCurve.Of(curve);

    /// <summary>Reads a code (case-insensitive); false when unknown.</summary>
    public static bool TryParse(string text, out IdmtCurve curve) => TextCodes.IdmtCurve.TryParse(text, out curve);
}
