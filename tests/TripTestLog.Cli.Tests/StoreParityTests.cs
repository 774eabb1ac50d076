using TripTestLog.Cli.Tests.Stores;
using TripTestLog.Ingest.Tests.Stores;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// The command line on each store: a copy of the demo's database made by `transfer`, into a second SQLite file and
/// into the server, answers every reading command exactly as the original does (the original's answers are pinned by
/// the golden files). Only the database's own name differs.
/// </summary>
public sealed class StoreParityTests(CopiedFleet fleet) : IClassFixture<CopiedFleet>
{
    private static readonly string[] Commands =
    [
        "check", "check --json", "check --csv", "check --wide --verdict too-late,too-early", "check --asset BPS-DB1-Q03",
        "findings", "findings --json", "findings --site Copperwell Depot", "fleet", "fleet --json",
        "devices", "devices --json --as-of 2024-06-30", "instruments", "history --asset BPS-DB1-Q03", "history --asset arw-db2-q02",
        "envelope --asset BPS-DB1-Q03", "envelope --asset ARW-MSB-Q01 --csv",
    ];

    public static TheoryData<Provider, string> ProvidersAndCommands()
    {
        var data = new TheoryData<Provider, string>();
        foreach (var provider in TestDatabase.Providers)
        {
            foreach (var command in Commands)
            {
                data.Add(provider, command);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(ProvidersAndCommands))]
    public void ACopyInEitherStore_AnswersEveryReadingCommand_AsTheOriginalDoes(Provider provider, string command)
    {
        var copy = fleet.Copy(provider);
        string[] args = command.StartsWith("findings --site", StringComparison.Ordinal) ? ["findings", "--site", "Copperwell Depot"] : command.Split(' ');

        // The lab policy lives beside the original; both read that one.
        if (args[0] is "check" or "findings" or "fleet")
        {
            args = [.. args, "--policy", Path.Combine(Path.GetDirectoryName(fleet.Original)!, "lab-policy.conf")];
        }

        var original = CliRun.Run([.. args, "--db", fleet.Original]);
        var copied = CliRun.Run([.. args, "--db", copy.Address]);

        Assert.Equal(original.Exit, copied.Exit);
        Assert.NotEqual("", original.Out);
        Assert.Equal(original.Out.Replace(Path.GetFullPath(fleet.Original), "<db>", StringComparison.Ordinal),
            copied.Out.Replace(CopiedFleet.Shown(copy), "<db>", StringComparison.Ordinal));
        Assert.Equal(original.Error, copied.Error);
    }
}
