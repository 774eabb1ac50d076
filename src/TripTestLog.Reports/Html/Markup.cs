using System.Globalization;
using System.Net;
using System.Security.Cryptography;
using System.Text;

namespace TripTestLog.Reports.Html;

/// <summary>
/// Small helpers for writing HTML by hand. Every piece of user data goes through <see cref="H"/>: asset tags,
/// locations, notes, names, make and model can hold anything, including markup.
/// </summary>
internal static class Markup
{
    /// <summary>Escapes text for an HTML element or attribute.</summary>
    public static string H(string? text) => WebUtility.HtmlEncode(text ?? "");

    /// <summary>A number in invariant form.</summary>
    public static string N(double value, string format = "0.###") => value.ToString(format, CultureInfo.InvariantCulture);

    /// <summary>
    /// A file name for a device page: the tag's letters, digits, '.', '-' and '_' kept, anything else replaced, with a
    /// short hash of the tag added when anything was replaced or the name is one Windows reserves (CON, NUL, COM1...),
    /// so two tags never share a page and every page opens on every system.
    /// </summary>
    public static string PageName(string tag)
    {
        var safe = new string([.. tag.Select(c => char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.' ? c : '_')]);
        if (safe == tag && !tag.StartsWith('.') && !Reserved(tag))
        {
            return tag + ".html";
        }

        var hash = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(tag)))[..8];
        return $"{safe.TrimStart('.')}-{hash}.html";
    }

    // Device names Windows reserves in any folder, whatever the case and whatever follows the first dot ("CON.html",
    // "nul.a.html"): Microsoft's "Naming Files, Paths, and Namespaces", naming conventions.
    private static bool Reserved(string tag)
    {
        var stem = tag.Split('.')[0].ToUpperInvariant();
        return stem is "CON" or "PRN" or "AUX" or "NUL"
            || (stem.Length == 4 && (stem.StartsWith("COM", StringComparison.Ordinal) || stem.StartsWith("LPT", StringComparison.Ordinal))
                && stem[3] is >= '0' and <= '9');
    }

    /// <summary>A link target for a page name, escaped for an attribute.</summary>
    public static string Href(string folder, string page) => H($"{folder}/{Uri.EscapeDataString(page)}");

    /// <summary>
    /// Writes a table of <paramref name="rows"/> whose cells are already escaped markup; a null cell is left empty for a
    /// person to write in, boxed on screen and in print.
    /// </summary>
    public static void Table(StringBuilder html, string[] headers, IEnumerable<string?[]> rows, string? cssClass = null)
    {
        html.Append(cssClass is null ? "<table>" : $"<table class=\"{cssClass}\">").Append("<thead><tr>");
        foreach (var h in headers)
        {
            html.Append("<th>").Append(H(h)).Append("</th>");
        }

        html.Append("</tr></thead><tbody>");
        var any = false;
        foreach (var row in rows)
        {
            any = true;
            html.Append("<tr>");
            foreach (var cell in row)
            {
                html.Append(cell is null ? "<td class=\"entry\"></td>" : $"<td>{cell}</td>");
            }

            html.Append("</tr>");
        }

        if (!any)
        {
            html.Append($"<tr><td colspan=\"{headers.Length}\" class=\"none\">none</td></tr>");
        }

        html.Append("</tbody></table>\n");
    }
}
