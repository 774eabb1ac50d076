using TripTestLog.Cli;

return CliApp.Run(args, new CliContext(Console.Out, Console.Error, TimeProvider.System, !Console.IsErrorRedirected));
