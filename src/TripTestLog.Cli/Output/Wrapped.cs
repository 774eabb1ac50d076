using System.Text;

namespace TripTestLog.Cli.Output;

/// <summary>Prose wrapped at word boundaries to fit a 100-column terminal, each line indented alike.</summary>
internal static class Wrapped
{
    public const int Width = 100;

    public static void Write(TextWriter writer, string text, int indent)
    {
        var pad = new string(' ', indent);
        var line = new StringBuilder(pad);
        foreach (var word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            if (line.Length > indent && line.Length + 1 + word.Length > Width)
            {
                writer.WriteLine(line.ToString());
                line.Clear().Append(pad);
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
