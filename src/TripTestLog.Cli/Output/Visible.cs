using System.Globalization;
using System.Text;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The one place where text meant for a person's terminal is made safe: a control character in a stored or quoted
/// value (an escape sequence that clears the screen, retitles the window or moves the cursor; a carriage return that
/// overwrites a line; a bidirectional override that reorders what is read) is written as its code, e.g. <c>\x1b</c> or
/// <c>\u202e</c>, so it is seen, not obeyed. Line feeds and tabs pass. JSON and CSV output bypass it
/// (<see cref="Exact"/>): JSON escapes control characters itself, and CSV keeps values exactly as stored.
/// </summary>
internal static class Visible
{
    /// <summary><paramref name="text"/> with its control characters written as codes.</summary>
    public static string Text(string? text)
    {
        if (text is null || !text.Any(Hidden))
        {
            return text ?? "";
        }

        var shown = new StringBuilder(text.Length + 8);
        foreach (var c in text)
        {
            Append(shown, c);
        }

        return shown.ToString();
    }

    /// <summary>A writer that shows control characters as codes, for all human output; idempotent.</summary>
    public static TextWriter Wrap(TextWriter writer) => writer is Writer ? writer : new Writer(writer);

    /// <summary>The writer underneath, for output that must stay byte for byte as produced (JSON, CSV, a policy file).</summary>
    public static TextWriter Exact(TextWriter writer) => writer switch
    {
        Writer w => w.Inner,
        ErrorLines e => Exact(e.Inner),
        _ => writer,
    };

    private static bool Hidden(char c) =>
        (char.IsControl(c) && c is not '\n' and not '\t') || c is >= '\u202a' and <= '\u202e' or >= '\u2066' and <= '\u2069' or '\u200e' or '\u200f';

    private static void Append(StringBuilder to, char c)
    {
        if (!Hidden(c))
        {
            to.Append(c);
        }
        else if (c <= '\u00ff')
        {
            to.Append("\\x").Append(((int)c).ToString("x2", CultureInfo.InvariantCulture));
        }
        else
        {
            to.Append("\\u").Append(((int)c).ToString("x4", CultureInfo.InvariantCulture));
        }
    }

    private sealed class Writer(TextWriter inner) : TextWriter(CultureInfo.InvariantCulture)
    {
        public TextWriter Inner { get; } = inner;

        public override Encoding Encoding => Inner.Encoding;

        public override void Write(char value)
        {
            if (Hidden(value))
            {
                Inner.Write(Text(value.ToString()));
            }
            else
            {
                Inner.Write(value);
            }
        }

        public override void Write(string? value) => Inner.Write(Text(value));

        public override void Write(char[] buffer, int index, int count) => Write(new string(buffer, index, count));

        public override void WriteLine() => Inner.WriteLine();

        public override void WriteLine(string? value) => Inner.WriteLine(Text(value));

        public override void Flush() => Inner.Flush();
    }
}
