using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;

namespace TripTestLog.Reports.Charts;

/// <summary>
/// Names a chart's clip paths after what it draws. The drawing library numbers them from a counter shared by every
/// thread, so the same report came out different each run, and a page that inlines several charts needs ids no two of
/// them share. Numbering each chart's ids in order of use and prefixing a digest of the drawing gives both: the same
/// chart always gets the same ids, two different charts never share one.
/// </summary>
internal static partial class ClipIds
{
    // A placeholder XML cannot hold, so no label's text is ever taken for an id.
    private const string Mark = "\u0001";

    public static string Steady(string svg)
    {
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        var numbered = LibraryId().Replace(svg, m => Mark + (seen.TryGetValue(m.Value, out var n) ? n : seen[m.Value] = seen.Count).ToString(System.Globalization.CultureInfo.InvariantCulture));
        if (seen.Count == 0)
        {
            return svg;
        }

        var digest = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(numbered)).AsSpan(0, 5));
        return numbered.Replace(Mark, "k" + digest + "_", StringComparison.Ordinal);
    }

    // The library's own names, cl_ and a number, where a clip path is defined (id="…") and where it is used (url(#…)).
    [GeneratedRegex("(?<=\"|\\(#)cl_[0-9A-Za-z]+")]
    private static partial Regex LibraryId();
}
