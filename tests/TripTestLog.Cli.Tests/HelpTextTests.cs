namespace TripTestLog.Cli.Tests;

/// <summary>Every command has help; its text is pinned by golden files.</summary>
public sealed class HelpTextTests
{
    [Theory]
    [InlineData("root", new string[0])]
    [InlineData("import", new[] { "import" })]
    [InlineData("check", new[] { "check" })]
    [InlineData("envelope", new[] { "envelope" })]
    [InlineData("demo", new[] { "demo" })]
    [InlineData("verify", new[] { "verify" })]
    [InlineData("backup", new[] { "backup" })]
    [InlineData("findings", new[] { "findings" })]
    [InlineData("fleet", new[] { "fleet" })]
    [InlineData("policy", new[] { "policy" })]
    [InlineData("report", new[] { "report" })]
    [InlineData("worksheet", new[] { "worksheet" })]
    [InlineData("devices", new[] { "devices" })]
    [InlineData("instruments", new[] { "instruments" })]
    [InlineData("history", new[] { "history" })]
    [InlineData("transfer", new[] { "transfer" })]
    public void HelpText_MatchesTheGoldenFile(string name, string[] command)
    {
        var (exit, output, _) = CliRun.Run([.. command, "--help"]);

        Assert.Equal(0, exit);
        Golden.Matches($"help-{name}.txt", output);
    }

    [Fact]
    public void AnUnknownOption_IsBadUsage()
    {
        var (exit, _, error) = CliRun.Run("check", "--colour");

        Assert.Equal(2, exit);
        Assert.Contains("--colour", error);
    }
}
