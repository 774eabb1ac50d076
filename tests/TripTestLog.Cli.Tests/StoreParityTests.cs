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

    public static TheoryData<Provider, string> ProvidersAndFolderCommands()
    {
        var data = new TheoryData<Provider, string>();
        foreach (var provider in TestDatabase.Providers)
        {
            data.Add(provider, "report");
            data.Add(provider, "worksheet --site Copperwell Depot");
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(ProvidersAndFolderCommands))]
    public void ACopyInEitherStore_WritesTheSameReportAndWorksheet_AsTheOriginal(Provider provider, string command)
    {
        var copy = fleet.Copy(provider);
        string[] args = command == "report" ? ["report", "--policy", Path.Combine(Path.GetDirectoryName(fleet.Original)!, "lab-policy.conf")] : ["worksheet", "--site", "Copperwell Depot", "--policy", Path.Combine(Path.GetDirectoryName(fleet.Original)!, "lab-policy.conf")];
        var folders = new[] { "original", "copy" }.Select(n => Path.Combine(Path.GetTempPath(), $"ttl-parity-{n}-{Guid.NewGuid():N}")).ToArray();

        try
        {
            var original = CliRun.Run([.. args, "--db", fleet.Original, "--out", folders[0]]);
            var copied = CliRun.Run([.. args, "--db", copy.Address, "--out", folders[1]]);

            Assert.Equal((0, 0), (original.Exit, copied.Exit));
            var files = Directory.GetFiles(folders[0], "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(folders[0], f)).Order(StringComparer.Ordinal).ToList();
            Assert.NotEmpty(files);
            Assert.Equal(files, Directory.GetFiles(folders[1], "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(folders[1], f)).Order(StringComparer.Ordinal));
            foreach (var file in files)
            {
                var a = File.ReadAllText(Path.Combine(folders[0], file)).Replace(Path.GetFullPath(fleet.Original), "<db>", StringComparison.Ordinal);
                var b = File.ReadAllText(Path.Combine(folders[1], file)).Replace(CopiedFleet.Shown(copy), "<db>", StringComparison.Ordinal);
                var line = a.Split('\n').Zip(b.Split('\n')).FirstOrDefault(p => p.First != p.Second);
                Assert.True(a == b, $"{file} differs between the original and the copy: {line.First} | {line.Second}");
            }
        }
        finally
        {
            foreach (var folder in folders.Where(Directory.Exists))
            {
                Directory.Delete(folder, recursive: true);
            }
        }
    }
}
