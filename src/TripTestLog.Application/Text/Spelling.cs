namespace TripTestLog.Application.Text;

/// <summary>
/// The nearest known name to a mistyped one, by edit distance (insertions, deletions, substitutions and swaps of two
/// neighbouring letters each count one), ignoring the case of A-Z. Only close matches are offered: a wild guess
/// misleads more than no guess.
/// </summary>
public static class Spelling
{
    /// <summary>
    /// The known name closest to <paramref name="typed"/>, or null when none is close: at most one edit for names of up
    /// to four letters, two up to eight, three beyond. A tie between two different names offers neither.
    /// </summary>
    public static string? Nearest(string typed, IEnumerable<string> known)
    {
        ArgumentNullException.ThrowIfNull(typed);
        ArgumentNullException.ThrowIfNull(known);
        var allowed = typed.Length switch { <= 4 => 1, <= 8 => 2, _ => 3 };
        string? best = null;
        var bestDistance = int.MaxValue;
        var tied = false;
        foreach (var name in known)
        {
            if (Math.Abs(name.Length - typed.Length) > allowed)
            {
                continue;
            }

            var d = Distance(typed, name);
            if (d < bestDistance)
            {
                (best, bestDistance, tied) = (name, d, false);
            }
            else if (d == bestDistance && !string.Equals(best, name, StringComparison.OrdinalIgnoreCase))
            {
                tied = true;
            }
        }

        return bestDistance <= allowed && !tied ? best : null;
    }

    /// <summary>Edits from <paramref name="a"/> to <paramref name="b"/>, case of A-Z ignored (optimal string alignment).</summary>
    public static int Distance(string a, string b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var d = new int[a.Length + 1, b.Length + 1];
        for (var i = 0; i <= a.Length; i++)
        {
            d[i, 0] = i;
        }

        for (var j = 0; j <= b.Length; j++)
        {
            d[0, j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = Same(a[i - 1], b[j - 1]) ? 0 : 1;
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && Same(a[i - 1], b[j - 2]) && Same(a[i - 2], b[j - 1]))
                {
                    d[i, j] = Math.Min(d[i, j], d[i - 2, j - 2] + 1);
                }
            }
        }

        return d[a.Length, b.Length];
    }

    private static bool Same(char x, char y) => char.ToUpperInvariant(x) == char.ToUpperInvariant(y);
}
