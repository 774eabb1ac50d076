using System.Net;
using System.Text;
using System.Text.RegularExpressions;

namespace TripTestLog.Reports.Tests;

/// <summary>
/// A page reduced to its structure, one element a line, indented two spaces a level: the tag name, then <c>#id</c> and
/// <c>.class</c> for each class, then the text of a heading or a table header in quotes. Data in cells and paragraphs,
/// other attributes (links, spans), the innards of an inline chart, a style sheet or a script, and comments are left out,
/// so the skeleton changes when a section, a heading or a column does, not when a reading does. Our pages are written
/// well formed, so a small tokenizer does: a closing tag that does not match the open element is an error, not a guess.
/// </summary>
internal static partial class HtmlSkeleton
{
    private static readonly HashSet<string> Void = ["area", "base", "br", "col", "embed", "hr", "img", "input", "link", "meta", "source", "track", "wbr"];

    // Shown as one line; what is inside is a chart's drawing or code, not the page's structure.
    private static readonly HashSet<string> Opaque = ["svg", "style", "script"];

    private static readonly HashSet<string> Titled = ["h1", "h2", "h3", "h4", "h5", "h6", "th"];

    public static string Of(string html)
    {
        var lines = new List<string>();
        var open = new Stack<(string Tag, int Line, StringBuilder? Text)>();
        var at = 0;
        while (at < html.Length)
        {
            var lt = html.IndexOf('<', at);
            Text(open, html[at..(lt < 0 ? html.Length : lt)]);
            if (lt < 0)
            {
                break;
            }

            if (html.AsSpan(lt).StartsWith("<!--"))
            {
                at = After(html, lt, "-->");
            }
            else if (html[lt + 1] is '!' or '?')
            {
                at = After(html, lt, ">");
            }
            else if (html[lt + 1] == '/')
            {
                var end = After(html, lt, ">");
                var name = html[(lt + 2)..(end - 1)].Trim().ToLowerInvariant();
                if (open.Count == 0 || open.Peek().Tag != name)
                {
                    throw new FormatException($"</{name}> at {lt} closes {(open.Count == 0 ? "nothing" : "<" + open.Peek().Tag + ">")}");
                }

                var (_, line, text) = open.Pop();
                if (text is not null)
                {
                    lines[line] += $" \"{Regex.Replace(WebUtility.HtmlDecode(text.ToString()), @"\s+", " ").Trim()}\"";
                }

                at = end;
            }
            else
            {
                var end = TagEnd(html, lt);
                var tag = html[(lt + 1)..(end - 1)];
                var name = NamePattern().Match(tag).Value.ToLowerInvariant();
                lines.Add(new string(' ', 2 * open.Count) + name + Marks(tag[name.Length..]));
                at = end;
                if (Opaque.Contains(name) && !tag.EndsWith('/'))
                {
                    at = Close(html, end, name);
                }
                else if (!Void.Contains(name) && !tag.EndsWith('/'))
                {
                    open.Push((name, lines.Count - 1, Titled.Contains(name) ? new StringBuilder() : null));
                }
            }
        }

        if (open.Count > 0)
        {
            throw new FormatException($"<{open.Peek().Tag}> is never closed");
        }

        return string.Join('\n', lines) + "\n";
    }

    // Text counts for the nearest heading or header it sits in, whatever inline markup it is wrapped in.
    private static void Text(Stack<(string Tag, int Line, StringBuilder? Text)> open, string text)
    {
        if (open.FirstOrDefault(e => e.Text is not null).Text is { } into)
        {
            into.Append(text);
        }
    }

    private static string Marks(string attributes)
    {
        var marks = new StringBuilder();
        foreach (Match a in AttributePattern().Matches(attributes))
        {
            var value = WebUtility.HtmlDecode(a.Groups[2].Success ? a.Groups[2].Value : a.Groups[3].Success ? a.Groups[3].Value : a.Groups[4].Value);
            switch (a.Groups[1].Value.ToLowerInvariant())
            {
                case "id":
                    marks.Append('#').Append(value);
                    break;
                case "class":
                    foreach (var c in value.Split(' ', StringSplitOptions.RemoveEmptyEntries))
                    {
                        marks.Append('.').Append(c);
                    }

                    break;
            }
        }

        return marks.ToString();
    }

    // The end of an opening tag: the first '>' outside a quoted attribute value.
    private static int TagEnd(string html, int lt)
    {
        char? quote = null;
        for (var i = lt + 1; i < html.Length; i++)
        {
            var c = html[i];
            if (quote is not null)
            {
                quote = c == quote ? null : quote;
            }
            else if (c is '"' or '\'')
            {
                quote = c;
            }
            else if (c == '>')
            {
                return i + 1;
            }
        }

        throw new FormatException($"the tag at {lt} never ends");
    }

    // Past the closing tag of an opaque element, counting elements of the same name nested in it (an SVG in an SVG).
    private static int Close(string html, int from, string name)
    {
        var depth = 1;
        var tags = new Regex($"<(/?){name}\\b", RegexOptions.IgnoreCase);
        for (var m = tags.Match(html, from); m.Success; m = m.NextMatch())
        {
            depth += m.Groups[1].Length == 0 ? 1 : -1;
            if (depth == 0)
            {
                return After(html, m.Index, ">");
            }
        }

        throw new FormatException($"<{name}> is never closed");
    }

    private static int After(string html, int from, string end)
    {
        var i = html.IndexOf(end, from, StringComparison.Ordinal);
        return i < 0 ? throw new FormatException($"no '{end}' after {from}") : i + end.Length;
    }

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9-]*")]
    private static partial Regex NamePattern();

    [GeneratedRegex("""([^\s=/>]+)(?:\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s>]+)))?""")]
    private static partial Regex AttributePattern();
}
