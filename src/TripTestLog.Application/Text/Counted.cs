using System.Globalization;

namespace TripTestLog.Application.Text;

/// <summary>A count with its noun in the right number: "1 device page", "2 device pages", "0 files".</summary>
public static class Counted
{
    /// <summary>
    /// <paramref name="count"/> and <paramref name="one"/>, or <paramref name="many"/> (default: <paramref name="one"/>
    /// with an s) for any count but one.
    /// </summary>
    public static string Of(long count, string one, string? many = null) =>
        count.ToString(CultureInfo.InvariantCulture) + " " + (count == 1 ? one : many ?? one + "s");
}
