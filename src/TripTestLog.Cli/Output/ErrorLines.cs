using System.Globalization;
using System.Text;

namespace TripTestLog.Cli.Output;

/// <summary>
/// Standard error as a person reads it: an "error: " or "warning: " sentence longer than 100 columns is wrapped at word
/// boundaries, its later lines indented by two, wherever in the tool it was written. Other lines (progress) pass as
/// they are.
/// </summary>
internal sealed class ErrorLines(TextWriter inner) : TextWriter(CultureInfo.InvariantCulture)
{
    /// <summary>The writer wrapped once; idempotent.</summary>
    public static TextWriter Wrap(TextWriter writer) => writer is ErrorLines ? writer : new ErrorLines(writer);

    /// <summary>The writer underneath, for text that must pass exactly as written (a progress line's carriage returns).</summary>
    public TextWriter Inner => inner;

    public override Encoding Encoding => inner.Encoding;

    public override void Write(char value) => inner.Write(value);

    public override void Write(string? value) => inner.Write(value);

    public override void Write(char[] buffer, int index, int count) => inner.Write(buffer, index, count);

    public override void WriteLine() => inner.WriteLine();

    public override void WriteLine(string? value)
    {
        if (value is { Length: > Wrapped.Width } && !value.Contains('\n', StringComparison.Ordinal)
            && (value.StartsWith("error: ", StringComparison.Ordinal) || value.StartsWith("warning: ", StringComparison.Ordinal)))
        {
            Wrapped.Write(inner, value, 0, 2);
        }
        else
        {
            inner.WriteLine(value);
        }
    }

    public override void Flush() => inner.Flush();
}
