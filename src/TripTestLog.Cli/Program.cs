using System.Text;
using TripTestLog.Cli;
using TripTestLog.Cli.Output;

using var cancel = new CancellationTokenSource();

// Ctrl+C asks the pipelines to stop: the file being imported is rolled back, the ones before it stay stored.
Console.CancelKeyPress += (_, e) =>
{
    e.Cancel = true;
    cancel.Cancel();
};

// Output sent to a file or a program is buffered: the console's own writer makes one system call a line, which was a
// fifth of listing a 10,000-device register. A terminal keeps the console's writer, so a person sees each line at once.
// The command flushes it (CliApp), where a failure to write is reported like any other; errors flush it first.
var redirected = Console.IsOutputRedirected;
var encoding = Console.OutputEncoding.CodePage == Encoding.UTF8.CodePage ? new UTF8Encoding(false) : Console.OutputEncoding;
var output = redirected ? new StreamWriter(Console.OpenStandardOutput(), encoding, 1 << 16) { AutoFlush = false } : Console.Out;
var error = redirected ? new ErrorAfterOutput(Console.Error, output) : Console.Error;
try
{
    return await CliApp.RunAsync(args, new CliContext(output, error, TimeProvider.System, !Console.IsErrorRedirected) { Cancel = cancel.Token });
}
finally
{
    try
    {
        output.Flush();
    }
    catch (IOException)
    {
        // Already reported by the command, which flushed its output before it ended.
    }
}
