namespace TripTestLog.Cli.Tests;

/// <summary>Everything that comes from user data is escaped in the report's HTML.</summary>
public sealed class ReportEscapingTests : IDisposable
{
    private const string Script = "<script>alert(1)</script>";
    private const string Image = "<img src=x onerror=alert(2)>";
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "ttl-esc-" + Guid.NewGuid().ToString("N")[..12]);

    public void Dispose()
    {
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        Directory.Delete(_folder, recursive: true);
    }

    [Fact]
    public void ScriptAndImageTags_InEveryUserField_AreWrittenAsText()
    {
        Directory.CreateDirectory(_folder);
        var db = Path.Combine(_folder, "t.db");
        static string Q(string s) => "\"" + s.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";
        var tag = "<b>X-01";
        var register = Path.Combine(_folder, "register.csv");
        File.WriteAllText(register, "asset_tag,site,location,family,curve,rated_current_a,poles,rated_voltage_v,commissioned_on,contact_limit_uohm,make,model,serial\n"
            + string.Join(',', Q(tag), Q(Script), Q(Image), "iec60898", "C", "16", "1", "230", "2019-01-01", "8000", Q(Script), Q(Image), Q(Script)) + "\n");
        var trips = Path.Combine(_folder, "trips.csv");
        File.WriteAllText(trips, "asset_tag,tested_at,stage,pole,current_a,trip_time_s,held_s,start,ambient_c,instrument,technician,note\n"
            + string.Join(',', Q(tag), "2026-03-18T12:00", "as-found", "all", "40.9", "75", "", "cold", "30", Q(Image), Q(Script), Q(Image)) + "\n");
        var contacts = Path.Combine(_folder, "contacts.csv");
        File.WriteAllText(contacts, "asset_tag,tested_at,stage,pole,resistance_uohm,test_current_a,temperature_c,instrument,technician\n"
            + string.Join(',', Q(tag), "2026-03-18", "as-found", "1", "5000", "10", "20", Q(Script), Q(Image)) + "\n");
        Assert.Equal(0, CliRun.Run("import", register, trips, contacts, "--db", db).Exit);

        var (exit, _, error) = CliRun.Run("report", "--db", db, "--out", Path.Combine(_folder, "report"));

        Assert.True(exit == 0, error);
        var pages = Directory.GetFiles(Path.Combine(_folder, "report"), "*.html", SearchOption.AllDirectories);
        Assert.Equal(2, pages.Length);
        foreach (var page in pages)
        {
            var html = File.ReadAllText(page);
            Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
            Assert.DoesNotContain("<img", html, StringComparison.OrdinalIgnoreCase);
            Assert.DoesNotContain("<b>", html, StringComparison.OrdinalIgnoreCase);
            Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html);
        }

        // The device page's file name keeps only safe characters; the link to it is escaped.
        var device = Assert.Single(Directory.GetFiles(Path.Combine(_folder, "report", "devices")));
        Assert.Matches("^_b_X-01-[0-9a-f]{8}\\.html$", Path.GetFileName(device));

        // The worksheet shows the same register fields (tag, site, location) and escapes them alike.
        Assert.Equal(0, CliRun.Run("worksheet", "--db", db, "--asset", tag, "--out", Path.Combine(_folder, "sheet")).Exit);
        var sheet = File.ReadAllText(Path.Combine(_folder, "sheet", "worksheet.html"));
        Assert.DoesNotContain("<script", sheet, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<img", sheet, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("&lt;b&gt;X-01", sheet);
    }
}
