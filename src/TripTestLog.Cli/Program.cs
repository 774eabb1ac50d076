using TripTestLog.Cli;

using var cancel = new CancellationTokenSource();

// Ctrl+C asks the pipelines to stop: the file being imported is rolled back, the ones before it stay stored.
Console.CancelKeyPress += (_, e) =>
{
    e.Cancel = true;
    cancel.Cancel();
};

return await CliApp.RunAsync(args, new CliContext(Console.Out, Console.Error, TimeProvider.System, !Console.IsErrorRedirected) { Cancel = cancel.Token });
