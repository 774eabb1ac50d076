using System.CommandLine;
using TripTestLog.Cli.Commands;

namespace TripTestLog.Cli;

/// <summary>The `triptestlog` command line: builds the commands and runs one.</summary>
internal static class CliApp
{
    public static RootCommand Build(CliContext cli) =>
        new("Keep breaker test records (trip times, contact and insulation resistance) in one SQLite database and judge every trip time against the band its standard allows.")
        {
            ImportCommand.Create(cli),
            CheckCommand.Create(cli),
            EnvelopeCommand.Create(cli),
            DemoCommand.Create(cli),
        };

    public static int Run(string[] args, CliContext cli)
    {
        var parse = Build(cli).Parse(args);
        var exit = parse.Invoke(new InvocationConfiguration { Output = cli.Out, Error = cli.Error });

        // System.CommandLine answers parse errors with 1; this tool keeps 1 for findings and uses 2 for bad usage.
        return parse.Errors.Count > 0 ? ExitCodes.BadInput : exit;
    }
}
