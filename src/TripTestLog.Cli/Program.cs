using System.Text;
using TripTestLog.Cli;

using var cancel = new CancellationTokenSource();

// Ctrl+C asks the pipelines to stop: the file being imported is rolled back, the ones before it stay stored.
Console.CancelKeyPress += (_, e) =>
{
    e.Cancel = true;
    cancel.Cancel();
};

// Output sent to a file or a program is buffered: the console's own writer makes one system call a line, which was a
// fifth of listing a 10,000-device register. A terminal keeps the console's writer, so a person sees each line at once.
var output = Console.IsOutputRedirected
    ? new StreamWriter(Console.OpenStandardOutput(), new UTF8Encoding(false), 1 << 16) { AutoFlush = false }
    : Console.Out;
try
{
    return await CliApp.RunAsync(args, new CliContext(output, Console.Error, TimeProvider.System, !Console.IsErrorRedirected) { Cancel = cancel.Token });
}
finally
{
    output.Flush();
}
