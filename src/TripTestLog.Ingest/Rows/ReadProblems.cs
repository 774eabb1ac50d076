namespace TripTestLog.Ingest.Rows;

/// <summary>The words of the decimal-comma problems, written once: a comma file cannot hold unquoted decimal commas.</summary>
internal static class ReadProblems
{
    /// <summary>The cause shared by every decimal-comma problem of a file, so they are reported as one.</summary>
    public const string DecimalCommaCause = "decimal-comma";

    private const string Fix = "write decimal points (12.5), or save the file with ';' between fields, where decimal commas are read";

    /// <summary>A row split into extra fields by decimal commas in a comma-separated file.</summary>
    public static string DecimalCommaFields(int fields, int headers, string sample) =>
        $"this row has {fields} fields but the header has {headers}: numbers such as {sample} look written with a decimal "
        + $"comma in a comma-separated file; {Fix}";

    /// <summary>A quoted number with a decimal comma in a file read with decimal points.</summary>
    public static string DecimalCommaValue(string text) =>
        $"'{text}' has a decimal comma but this file is read with decimal points; {Fix}, or import it with --decimal ,";
}
