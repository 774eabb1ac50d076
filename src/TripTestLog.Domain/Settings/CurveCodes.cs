namespace TripTestLog.Domain.Settings;

/// <summary>The words record files and the command line use for IDMT curves.</summary>
public static class CurveCodes
{
    private static readonly IReadOnlyDictionary<IdmtCurve, string> Codes = new Dictionary<IdmtCurve, string>
    {
        [IdmtCurve.StandardInverse] = "standard-inverse",
        [IdmtCurve.VeryInverse] = "very-inverse",
        [IdmtCurve.ExtremelyInverse] = "extremely-inverse",
        [IdmtCurve.LongTimeInverse] = "long-time-inverse",
        [IdmtCurve.IeeeModeratelyInverse] = "ieee-moderately-inverse",
        [IdmtCurve.IeeeVeryInverse] = "ieee-very-inverse",
        [IdmtCurve.IeeeExtremelyInverse] = "ieee-extremely-inverse",
    };

    /// <summary>Every code, in declaration order.</summary>
    public static IEnumerable<string> All => Codes.Values;

    /// <summary>The code of a curve.</summary>
    public static string Of(IdmtCurve curve) => Codes[curve];

    /// <summary>Reads a code (case-insensitive); false when unknown.</summary>
    public static bool TryParse(string text, out IdmtCurve curve)
    {
        var match = Codes.FirstOrDefault(kv => string.Equals(kv.Value, text.Trim(), StringComparison.OrdinalIgnoreCase));
        curve = match.Key;
        return match.Value is not null;
    }
}
