namespace TripTestLog.Cli.Tests;

/// <summary>Every command, given a bad path or a bad value, answers with plain words and a non-zero exit, never a stack trace.</summary>
public sealed class NoStackTraceTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-bad-" + Guid.NewGuid().ToString("N")[..12]);

    public NoStackTraceTests()
    {
        Directory.CreateDirectory(_folder);
        File.WriteAllText(Path.Combine(_folder, "not-a-database.db"), "this is a text file, not SQLite\n");
        File.WriteAllText(Path.Combine(_folder, "register.csv"),
            "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial\n"
            + "T-01,Site,Way 1,iec60898,C,16,1,230,2019-01-01,,,,\n");
        CliRun.Run("import", Path.Combine(_folder, "register.csv"), "--db", Path.Combine(_folder, "good.db"));
    }

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    public static TheoryData<string[]> Mistakes => new()
    {
        new[] { "import", "/no/such/file.csv", "--db", "{good}" },
        new[] { "import", "{dir}", "--db", "{text}/inside/x.db" },
        new[] { "check", "--db", "/no/such.db" },
        new[] { "check", "--db", "{text}" },
        new[] { "check", "--db", "{good}", "--asset", "" },
        new[] { "findings", "--db", "{text}" },
        new[] { "findings", "--db", "{good}", "--as-of", "tomorrow" },
        new[] { "fleet", "--db", "{good}", "--top", "0" },
        new[] { "fleet", "--db", "{good}", "--top", "many" },
        new[] { "report", "--db", "{good}", "--out", "{text}/inside" },
        new[] { "report", "--db", "/no/such.db" },
        new[] { "policy", "--policy", "/no/such/policy.conf" },
        new[] { "verify", "--db", "/no/such.db" },
        new[] { "verify", "--db", "{text}" },
        new[] { "backup", "{dir}/missing-folder/copy.db", "--db", "{good}" },
        new[] { "backup", "{dir}/copy.db", "--db", "{text}" },
        new[] { "envelope", "--curve", "X", "--rated", "16" },
        new[] { "envelope", "--curve", "C", "--rated", "-3" },
        new[] { "envelope", "--asset", "T-01", "--db", "{text}" },
        new[] { "demo", "--records", "{text}", "--out", "{dir}/demo" },
        new[] { "worksheet", "--db", "{text}", "--asset", "T-01" },
        new[] { "worksheet", "--db", "{good}", "--asset", "T-01", "--out", "{text}/inside" },
        new[] { "worksheet", "--db", "/no/such.db", "--site", "Site" },
        new[] { "devices", "--db", "{text}" },
        new[] { "devices", "--db", "{good}", "--as-of", "2026-13-01" },
        new[] { "instruments", "--db", "/no/such.db" },
        new[] { "history", "--db", "{text}", "--asset", "T-01" },
        new[] { "history", "--db", "{good}", "--asset", " padded " },
        new[] { "check", "--db", "{good}", "--verdict", "maybe" },
        new[] { "import", "{dir}", "--db", "{good}", "--as-of", "soon" },
        new[] { "no-such-command" },
    };

    [Theory]
    [MemberData(nameof(Mistakes))]
    public void AMistake_GetsPlainWords_AndANonZeroExit(string[] args)
    {
        var resolved = args.Select(a => a.Replace("{good}", Path.Combine(_folder, "good.db"), StringComparison.Ordinal)
            .Replace("{text}", Path.Combine(_folder, "not-a-database.db"), StringComparison.Ordinal)
            .Replace("{dir}", _folder, StringComparison.Ordinal)).ToArray();

        var (exit, output, error) = CliRun.Run(resolved);

        Assert.Equal(2, exit);
        Assert.DoesNotContain("   at ", output + error);
        Assert.DoesNotContain("Exception", output + error);
        Assert.False(string.IsNullOrWhiteSpace(error), "a mistake must say what is wrong");
    }
}
