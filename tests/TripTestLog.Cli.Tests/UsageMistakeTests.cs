namespace TripTestLog.Cli.Tests;

/// <summary>
/// A mistyped option or command gets one sentence on stderr, with the nearest real word when it is close, exit 2, and
/// nothing run (common practice for command lines, no source: suggestions by edit distance, Damerau 1964).
/// </summary>
public sealed class UsageMistakeTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-usage-" + Guid.NewGuid().ToString("N")[..12]);

    public UsageMistakeTests() => Directory.CreateDirectory(_folder);

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Theory]
    [InlineData("usage-check-asest.txt", new[] { "check", "--asest", "X" })]
    [InlineData("usage-import-delimitter.txt", new[] { "import", "--delimitter", ";" })]
    [InlineData("usage-chek.txt", new[] { "chek" })]
    [InlineData("usage-far-option.txt", new[] { "check", "--colour" })]
    [InlineData("usage-far-command.txt", new[] { "summarise" })]
    [InlineData("usage-top-many.txt", new[] { "fleet", "--top", "many" })]
    [InlineData("usage-no-command.txt", new string[0])]
    public void AMistypedWord_IsOneSentenceOnStderr_WithExit2(string golden, string[] args)
    {
        var (exit, output, error) = CliRun.Run(args);

        Assert.Equal(2, exit);
        Assert.Equal("", output);
        Golden.Matches(golden, error);
        Assert.All(error.ReplaceLineEndings("\n").TrimEnd('\n').Split('\n'), l => Assert.True(l.Length <= 100, l));
    }

    [Fact]
    public void AnOptionTypo_SuggestsTheNearOption()
    {
        Assert.Equal("error: unknown option --asest; did you mean --asset?\n", CliRun.Run("check", "--asest", "X").Error.ReplaceLineEndings("\n"));
        Assert.Equal("error: unknown option --delimitter; did you mean --delimiter?\n",
            CliRun.Run("import", "--delimitter", ";").Error.ReplaceLineEndings("\n"));
        Assert.Equal("error: unknown command chek; did you mean check?\n", CliRun.Run("chek").Error.ReplaceLineEndings("\n"));
    }

    [Fact]
    public void AnOptionTypo_RunsNothing_SoItsValueIsNeverTakenForAFile()
    {
        var db = Path.Combine(_folder, "new.db");
        File.WriteAllText(Path.Combine(_folder, ";"), "not a record file\n");

        var (exit, _, error) = CliRun.Run("import", "--delimitter", Path.Combine(_folder, ";"), "--db", db);

        Assert.Equal(2, exit);
        Assert.DoesNotContain("no such file", error, StringComparison.Ordinal);
        Assert.False(File.Exists(db), "a mistyped import must not create or touch the database");
    }

    [Fact]
    public void AskingForHelp_StillShowsTheHelp_EvenBesideATypo()
    {
        var (exit, output, _) = CliRun.Run("check", "--asest", "X", "--help");

        Assert.Equal(0, exit);
        Assert.Contains("--asset <TAG>", output, StringComparison.Ordinal);
    }
}
