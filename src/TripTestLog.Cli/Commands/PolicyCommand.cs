using System.CommandLine;
using TripTestLog.Application.Findings;
using TripTestLog.Cli.Services;

namespace TripTestLog.Cli.Commands;

/// <summary>`policy`: prints the lab policy in force, as a file a lab can edit and save beside its database.</summary>
internal static class PolicyCommand
{
    public static Command Create(CliContext cli)
    {
        var db = CommonOptions.Database();
        var policy = new Option<FileInfo?>("--policy") { Description = "Lab policy file to check and print", HelpName = "FILE" };
        var command = new Command("policy", $"Print the lab policy in force, ready to edit as {PolicyFile.BesideDatabase}")
        {
            db, policy,
        };
        command.SetAction(parse =>
        {
            if (PolicyLoader.Load(parse.GetValue(policy), parse.GetValue(db)!, out var problem) is not { } loaded)
            {
                cli.Error.WriteLine($"error: {problem}");
                return ExitCodes.BadInput;
            }

            cli.Out.Write($"# in force: {loaded.From}\n");
            cli.Out.Write(PolicyFile.Write(loaded.Policy));
            return ExitCodes.Ok;
        });
        return command;
    }
}
