namespace TripTestLog.Cli.Tests;

/// <summary>What a person reads fits a 100-column terminal; --wide gives every column.</summary>
public sealed class NarrowOutputTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    public static TheoryData<string[]> Commands => new()
    {
        { ["check"] },
        { ["findings"] },
        { ["fleet"] },
        { ["verify"] },
        { ["policy"] },
        { ["envelope", "--asset", "ARW-MSB-Q01"] },
        { ["worksheet", "--site", "Copperwell Depot", "--out", "<tmp>"] },
        { ["import", "<records>"] },
    };

    [Theory]
    [MemberData(nameof(Commands))]
    public void HumanOutput_FitsA100ColumnTerminal(string[] command)
    {
        var args = command.Select(a => a switch
        {
            "<tmp>" => Path.Combine(fleet.Folder, "narrow-worksheet"),
            "<records>" => Path.Combine(Golden.RepositoryRoot(), "sample-records"),
            _ => a,
        }).ToArray();

        var (_, output, error) = CliRun.Run([.. args, "--db", fleet.Database]);

        Assert.True(output.Length > 0, error);
        var tooWide = output.ReplaceLineEndings("\n").Split('\n')
            .Where(l => l.Length > 100 && l.Contains(' ', StringComparison.Ordinal)) // a bare path cannot be broken
            .ToList();
        Assert.True(tooWide.Count == 0, string.Join('\n', tooWide));
    }

    [Fact]
    public void TheVerdictTable_IsNarrowByDefault_AndWideOnRequest()
    {
        var (_, narrow, _) = CliRun.Run("check", "--asset", "BPS-DB1-Q03", "--db", fleet.Database);
        var (_, wide, _) = CliRun.Run("check", "--asset", "BPS-DB1-Q03", "--db", fleet.Database, "--wide");

        Golden.Matches("check-narrow-bps-db1-q03.txt", narrow);
        Assert.StartsWith("Asset        Tested            Pole  Start  Multiple  Result           Band", narrow);
        Assert.StartsWith("Asset         Tested               Stage     Pole  Start", wide);
        Assert.Contains(wide.Split('\n'), l => l.Length > 100);
    }
}
