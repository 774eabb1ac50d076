using System.Text;

namespace TripTestLog.Cli.Output;

/// <summary>Prose wrapped at word boundaries to fit a 100-column terminal, each line indented alike.</summary>
internal static class Wrapped
{
    public const int Width = 100;

    public static void Write(TextWriter writer, string text, int indent) => Write(writer, text, indent, indent);

    /// <summary>A list item: the first line indented by <paramref name="first"/>, the lines it wraps onto by <paramref name="rest"/>.</summary>
    public static void Write(TextWriter writer, string text, int first, int rest)
    {
        text = Visible.Text(text);
        var indent = first;
        var line = new StringBuilder(new string(' ', first));
        foreach (var word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            if (line.Length > indent && line.Length + 1 + word.Length > Width)
            {
                writer.WriteLine(line.ToString());
                indent = rest;
                line.Clear().Append(' ', rest);
            }

            if (line.Length > indent)
            {
                line.Append(' ');
            }

            line.Append(word);
        }

        if (line.Length > indent)
        {
            writer.WriteLine(line.ToString());
        }
    }
}
