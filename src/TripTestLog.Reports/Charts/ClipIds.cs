using System.Buffers;
using System.Globalization;
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

    /// <summary>
    /// Appends <paramref name="svg"/> from <paramref name="from"/> (less its first <paramref name="skip"/> characters) to
    /// <paramref name="html"/> with the clip ids renamed. The digest covers the markup from <paramref name="from"/> with
    /// each id numbered in order of use; it is taken as the markup is read, so the markup is never copied but into the page.
    /// </summary>
    public static StringBuilder AppendSteady(StringBuilder html, string svg, int from, int skip)
    {
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        var lookup = seen.GetAlternateLookup<ReadOnlySpan<char>>();
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        var text = svg.AsSpan(from);
        var at = 0;
        foreach (var match in LibraryId().EnumerateMatches(text))
        {
            var id = text.Slice(match.Index, match.Length);
            if (!lookup.TryGetValue(id, out var n))
            {
                n = seen.Count;
                seen[id.ToString()] = n;
            }

            Add(hash, text[at..match.Index]);
            Add(hash, Mark + n.ToString(CultureInfo.InvariantCulture));
            at = match.Index + match.Length;
        }

        if (seen.Count == 0)
        {
            return html.Append(text[skip..]);
        }

        Add(hash, text[at..]);
        Span<byte> digest = stackalloc byte[32];
        hash.GetHashAndReset(digest);
        var prefix = "k" + Convert.ToHexStringLower(digest[..5]) + "_";
        at = skip;
        foreach (var match in LibraryId().EnumerateMatches(text))
        {
            html.Append(text[at..match.Index]).Append(prefix).Append(lookup[text.Slice(match.Index, match.Length)]);
            at = match.Index + match.Length;
        }

        return html.Append(text[at..]);
    }

    // The markup's UTF-8 bytes into the digest, a piece at a time.
    private static void Add(IncrementalHash hash, ReadOnlySpan<char> piece)
    {
        var bytes = ArrayPool<byte>.Shared.Rent(Encoding.UTF8.GetMaxByteCount(piece.Length));
        var length = Encoding.UTF8.GetBytes(piece, bytes);
        hash.AppendData(bytes, 0, length);
        ArrayPool<byte>.Shared.Return(bytes);
    }

    // The library's own names, cl_ and a number, where a clip path is defined (id="…") and where it is used (url(#…)).
    [GeneratedRegex("(?<=\"|\\(#)cl_[0-9A-Za-z]+")]
    private static partial Regex LibraryId();
}
