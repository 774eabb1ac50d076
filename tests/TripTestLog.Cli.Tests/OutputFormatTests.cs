using System.Text.Json;
using TripTestLog.Cli.Output;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// One way to write each format: every JSON output spells a character the same way, and the verdict CSV has the JSON's
/// fields in the JSON's order; every CSV cell passes the one formula guard (OWASP, "CSV Injection").
/// </summary>
public sealed class OutputFormatTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-format-" + Guid.NewGuid().ToString("N")[..12]);

    public OutputFormatTests() => Directory.CreateDirectory(_folder);

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void VerdictJson_WritesTheLessOrEqualSign_AsItself_NotAsAnEscape()
    {
        var db = Imported();

        var (exit, output, _) = CliRun.Run("check", "--json", "--db", db);

        // IEC 60898-1 Table 7 a: 1.13 In from cold, no trip at t <= 1 h; a hold of an hour proves it, and the reason says so.
        Assert.Equal(0, exit);
        Assert.Contains("no trip at t ≤ 1 h", output, StringComparison.Ordinal);
        Assert.DoesNotContain("\\u", output, StringComparison.Ordinal);
    }

    [Fact]
    public void VerdictCsv_HasTheJsonFields_InTheJsonOrder()
    {
        var db = Imported();

        var json = CliRun.Run("check", "--json", "--db", db).Out;
        var csv = CliRun.Run("check", "--csv", "--db", db).Out;

        using var document = JsonDocument.Parse(json);
        var names = document.RootElement[0].EnumerateObject().Select(p => p.Name);
        Assert.Equal(string.Join(',', names), csv.Split('\n')[0]);
    }

    [Theory]
    [InlineData("=1+2", "'=1+2")]
    [InlineData("+1", "'+1")]
    [InlineData("-1", "'-1")]
    [InlineData("@SUM(A1)", "'@SUM(A1)")]
    [InlineData("\tx", "'\tx")]
    [InlineData("a,b", "\"a,b\"")]
    [InlineData("say \"hi\"", "\"say \"\"hi\"\"\"")]
    [InlineData("plain", "plain")]
    public void ATextCell_IsNeutralisedAndQuoted_AsOwaspAdvises(string text, string written)
    {
        var writer = new StringWriter { NewLine = "\n" };

        new CsvOutput(writer).Cell(text).EndRow();

        Assert.Equal(written + "\n", writer.ToString());
    }

    [Fact]
    public void NumbersListsAndBlanks_AreWrittenAsValues_NeverNeutralised()
    {
        var writer = new StringWriter { NewLine = "\n" };

        new CsvOutput(writer).Cell(-1.5).Cell(null).Cell(42L).Cell(true).Cell(new CsvNumber("6.78")).Cell(new[] { "a", "=b" }).EndRow();

        Assert.Equal("-1.5,,42,true,6.78,a; =b\n", writer.ToString());
    }

    private string Imported() => OneBreaker.Database(_folder);
}
