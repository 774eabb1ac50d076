namespace TripTestLog.Cli.Output;

/// <summary>
/// One CSV cell, quoted where needed and neutralised where a spreadsheet would run it as a formula: a cell starting with
/// '=', '+', '-', '@', a tab or a carriage return gets a leading apostrophe (OWASP, "CSV Injection"). Numbers are
/// written by the caller and never pass through here, so a negative value stays a number.
/// </summary>
internal static class CsvCell
{
    public static string Text(string? value)
    {
        if (string.IsNullOrEmpty(value))
        {
            return "";
        }

        if (value[0] is '=' or '+' or '-' or '@' or '\t' or '\r')
        {
            value = "'" + value;
        }

        return value.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : value;
    }
}
