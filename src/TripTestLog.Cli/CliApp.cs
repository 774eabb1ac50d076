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

    public static async Task<int> RunAsync(string[] args, CliContext cli)
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

        Exception? fault = null;
        try
        {
            // Ctrl+C is the program's own (it rolls back the file in progress), so System.CommandLine adds no handler of its own.
            exit = await parse.InvokeAsync(new InvocationConfiguration { Output = cli.Out, Error = cli.Error, EnableDefaultExceptionHandler = false, ProcessTerminationTimeout = null })
                .ConfigureAwait(false);

            // Standard output may be buffered (Program): a failure to write the last of it (a full disk) is the command's.
            cli.Out.Flush();
        }
        catch (Exception e) when (e is not OutOfMemoryException && Faults.IsTheUsers(e))
        {
            // A problem the person can fix (the input, the database, the disk): one plain sentence, never a stack trace.
            cli.Error.WriteLine($"error: {Plain(e)}");
            exit = ExitCodes.BadInput;
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            // Anything else is a fault in the tool: the person is told so and where the details are; the log gets the stack.
            fault = e;
            exit = ExitCodes.InternalError;
        }

        // System.CommandLine answers parse errors with 1; this tool keeps 1 for findings and uses 2 for bad usage.
        exit = parse.Errors.Count > 0 ? ExitCodes.BadInput : exit;
        var logged = LogRun(parse, args, exit, clock.Elapsed, fault);
        if (fault is not null)
        {
            cli.Error.WriteLine(logged is null
                ? "internal error: a fault in triptestlog itself, not in your input, stopped the command, and the log could not be written; please report it with the command you ran"
                : $"internal error: a fault in triptestlog itself, not in your input, stopped the command; the details are in {logged}: please report it with that file");
        }

        return exit;
    }

    // Every run against a database leaves one line in the log beside it: who ran what, and how it ended. A fault in the
    // tool is logged whatever the command, with its stack: beside the database when the command names one whose folder
    // exists, otherwise in the working folder. Returns the log's path when something was written there.
    private static string? LogRun(ParseResult parse, string[] args, int exit, TimeSpan took, Exception? fault)
    {
        var db = parse.Errors.Count == 0 && parse.CommandResult.Command.Options.FirstOrDefault(o => o.Name == "--db") is Option<Services.StoreAddress> option
            ? parse.GetValue(option)
            : null;
        string folder;
        if (db is { Exists: true })
        {
            folder = db.Folder;
        }
        else if (fault is not null)
        {
            folder = db is not null && Directory.Exists(db.Folder) ? db.Folder : Directory.GetCurrentDirectory();
        }
        else
        {
            return null;
        }

        try
        {
            using var log = Logging.InFolder(folder);
            var line = string.Join(' ', args.Select(a => a.Contains(' ', StringComparison.Ordinal) ? $"\"{a}\"" : a));
            if (fault is not null)
            {
                log.Error(fault, "internal error in: triptestlog {Command}", line);
            }

            log.Information("{User} on {Machine} ran: triptestlog {Command}; exit {Exit} ({Meaning}) after {Seconds:0.0} s",
                Environment.UserName, Environment.MachineName, line,
                exit, exit switch { ExitCodes.Ok => "done", ExitCodes.Findings => "findings", ExitCodes.InternalError => "internal error", _ => "bad usage or input" },
                took.TotalSeconds);
            return Logging.PathIn(folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A log that cannot be written never turns a finished command into a failure.
            return null;
        }
    }

    // The innermost message on one line: what failed, in the words of the layer that knew.
    private static string Plain(Exception e) => Services.Stores.Plain(e) ?? Services.WriteFailure.Sentence(e) ?? Innermost(e).Message.ReplaceLineEndings(" ").Trim();

    private static Exception Innermost(Exception e)
    {
        while (e.InnerException is { } inner)
        {
            e = inner;
        }

        return e;
    }
}
