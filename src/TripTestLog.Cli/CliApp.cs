using System.CommandLine;
using TripTestLog.Cli.Commands;

namespace TripTestLog.Cli;

/// <summary>The `triptestlog` command line: builds the commands and runs one.</summary>
internal static class CliApp
{
    // A named command rather than RootCommand, whose name follows the host process (e.g. a test runner's).
    public static Command Build(CliContext cli) =>
        new("triptestlog", "Keep breaker test records (trip times, contact and insulation resistance) in one database, a SQLite file or a shared PostgreSQL server, and judge every trip time against the band its standard allows.")
        {
            // Help wraps at 100 columns whatever the terminal, so it reads the same everywhere (and in golden files).
            new System.CommandLine.Help.HelpOption { Action = new System.CommandLine.Help.HelpAction { MaxWidth = 100 } },
            new VersionOption(),
            ImportCommand.Create(cli),
            CheckCommand.Create(cli),
            FindingsCommand.Create(cli),
            FleetCommand.Create(cli),
            PolicyCommand.Create(cli),
            ReportCommand.Create(cli),
            EnvelopeCommand.Create(cli),
            VerifyCommand.Create(cli),
            BackupCommand.Create(cli),
            MigrateCommand.Create(cli),
            WorksheetCommand.Create(cli),
            DevicesCommand.Create(cli),
            InstrumentsCommand.Create(cli),
            HistoryCommand.Create(cli),
            TransferCommand.Create(cli),
            DemoCommand.Create(cli),
        };

    public static int Run(string[] args, CliContext cli)
    {
        // Everything printed for a person passes one guard against terminal control characters in values.
        // Errors longer than a 100-column terminal are wrapped, wherever they are written.
        cli = cli with { Out = Output.Visible.Wrap(cli.Out), Error = Output.ErrorLines.Wrap(Output.Visible.Wrap(cli.Error)) };
        var parse = Build(cli).Parse(args);
        var clock = System.Diagnostics.Stopwatch.StartNew();
        int exit;

        // A mistyped word is one sentence with the nearest right one, not the whole help; nothing runs.
        // (Asking for help still shows the help.)
        if (!args.Any(a => a is "--help" or "-h" or "-?") && UsageErrors.Of(parse) is { Count: > 0 } mistakes)
        {
            UsageErrors.Write(cli.Error, mistakes);
            return ExitCodes.BadInput;
        }

        try
        {
            exit = parse.Invoke(new InvocationConfiguration { Output = cli.Out, Error = cli.Error, EnableDefaultExceptionHandler = false });
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // Whatever went wrong, a person gets one plain sentence, never a stack trace.
            cli.Error.WriteLine($"error: {Plain(e)}");
            exit = ExitCodes.BadInput;
        }

        // System.CommandLine answers parse errors with 1; this tool keeps 1 for findings and uses 2 for bad usage.
        exit = parse.Errors.Count > 0 ? ExitCodes.BadInput : exit;
        LogRun(parse, args, exit, clock.Elapsed);
        return exit;
    }

    // Every run against a database leaves one line in the log beside it: who ran what, and how it ended.
    private static void LogRun(ParseResult parse, string[] args, int exit, TimeSpan took)
    {
        if (parse.Errors.Count > 0 || parse.CommandResult.Command.Options.FirstOrDefault(o => o.Name == "--db") is not Option<Services.StoreAddress> option
            || parse.GetValue(option) is not { Exists: true } db)
        {
            return;
        }

        try
        {
            using var log = Logging.BesideDatabase(db);
            log.Information("{User} on {Machine} ran: triptestlog {Command}; exit {Exit} ({Meaning}) after {Seconds:0.0} s",
                Environment.UserName, Environment.MachineName, string.Join(' ', args.Select(a => a.Contains(' ', StringComparison.Ordinal) ? $"\"{a}\"" : a)),
                exit, exit switch { ExitCodes.Ok => "done", ExitCodes.Findings => "findings", _ => "bad usage or input" }, took.TotalSeconds);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A log that cannot be written never turns a finished command into a failure.
        }
    }

    // The innermost message on one line: what failed, in the words of the layer that knew.
    private static string Plain(Exception e) => Services.Stores.Plain(e) ?? Innermost(e).Message.ReplaceLineEndings(" ").Trim();

    private static Exception Innermost(Exception e)
    {
        while (e.InnerException is { } inner)
        {
            e = inner;
        }

        return e;
    }
}
