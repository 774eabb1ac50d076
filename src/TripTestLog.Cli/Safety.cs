namespace TripTestLog.Cli;

/// <summary>The caution every human-readable report ends with.</summary>
internal static class Safety
{
    public const string Caution =
        "Caution: primary-injection and insulation testing involve high currents and voltages and arc-flash hazard. "
        + "Isolate and lock out, wear arc-rated PPE, and let only qualified staff operate test sets. These verdicts "
        + "support decisions; they do not replace the manufacturer's data, local codes or licensed engineering practice.";
}
