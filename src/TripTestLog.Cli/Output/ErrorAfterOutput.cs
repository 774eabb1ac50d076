using System.Globalization;
using System.Text;

namespace TripTestLog.Cli.Output;

/// <summary>
/// Standard error when standard output is buffered: what was written to the output goes out before each message, so a
/// log that takes both (2&gt;&amp;1) keeps them in the order they were written.
/// </summary>
internal sealed class ErrorAfterOutput(TextWriter error, TextWriter output) : TextWriter(CultureInfo.InvariantCulture)
{
    public override Encoding Encoding => error.Encoding;

    public override void Write(char value)
    {
        FlushOutput();
        error.Write(value);
    }

    public override void Write(string? value)
    {
        FlushOutput();
        error.Write(value);
    }

    public override void Write(char[] buffer, int index, int count)
    {
        FlushOutput();
        error.Write(buffer, index, count);
    }

    public override void WriteLine()
    {
        FlushOutput();
        error.WriteLine();
    }

    public override void WriteLine(string? value)
    {
        FlushOutput();
        error.WriteLine(value);
    }

    public override void Flush() => error.Flush();

    private void FlushOutput()
    {
        try
        {
            output.Flush();
        }
        catch (IOException)
        {
            // The output cannot be written (a full disk, say): the message goes out all the same, and the command's own
            // flush of the output reports the failure.
        }
    }
}
