using System.Net;
using System.Text.RegularExpressions;
using Microsoft.Playwright;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// The decision rule on the pages a lab signs: ISO/IEC 17025:2017, 7.8.6 asks a statement of conformity to name the
/// decision rule it was made under; ILAC-G8:09/2019 gives the rules; the expanded uncertainty is U = k u with each
/// accuracy ±a rectangular, u = a / √3 (GUM, JCGM 100:2008, 4.3.7). The sample register states no accuracy, so every
/// figure here comes from the shipped defaults: time ±(0.5 % + 10 ms), current ±2 %, k = 2.
/// </summary>
public sealed partial class DecisionRulePageTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    private const string Chromium = "/usr/bin/chromium";

    [Fact]
    public void TheDevicePage_StatesTheRule_AndShowsUBesideEachVerdict()
    {
        var page = Text(Path.Combine(fleet.Folder, "report", "devices", "ARW-DB1-Q01.html"));

        // ISO/IEC 17025:2017, 7.8.6: the rule is stated, above the verdicts and in the sign-off block.
        Assert.Equal(2, Regex.Matches(page, Regex.Escape("Decision rule: simple acceptance (the limit as written) (simple, ILAC-G8:09/2019).")).Count);

        // IEC 60898-1 Table 7 e on a B6 at 30.28 A, tripped after 0.015 s. By hand (GUM 4.3.7, k = 2):
        // U = 2 x (0.005 x 0.015 + 0.010) / √3 = 0.01163 s; U(I) = 2 x 0.02 x 30.28 / √3 = 0.6993 A.
        Assert.Contains("pass (U = 0.012 s; U(I) = 0.699 A): ", page);

        // The register states no accuracy for the injection set: the page says the defaults were used.
        Assert.Contains("time and current from the lab policy's defaults (not in the instrument register)", page);
        Assert.Contains("accuracy used on that date", page);
        Assert.Contains("current ±2 %, k = 2 (time, current, k: policy defaults, none in the register)", page);
        Assert.Contains("Insulation: the tester's accuracy from the instrument register, or where it states none the lab policy's default, ±5 %, k = 2.", page);
    }

    [Fact]
    public void TheFleetPage_StatesTheRule_AndThatTheRegisterStatesNoAccuracy()
    {
        var page = Text(Path.Combine(fleet.Folder, "report", "index.html"));

        Assert.Contains("Decision rule: simple (simple acceptance, ILAC-G8:09/2019)", page);
        Assert.Contains("the instrument register states no accuracy for any of its 14 instruments", page);
        Assert.Contains("time ±(0.5 % + 0.01 s), current ±2 %, contact resistance ±(1 % + 1 µΩ), insulation ±5 %, k = 2", page);
    }

    [Fact]
    public void TheDemo_WritesASecondReport_UnderTheGuardedRule_WhichNamesIt_AndWithholdsTheVerdictsWithinU()
    {
        var folder = Path.Combine(fleet.Folder, "report-guarded");
        Assert.True(File.Exists(Path.Combine(folder, "index.html")), "the demo wrote no report under the guarded rule");
        Assert.Equal(Directory.GetFiles(Path.Combine(fleet.Folder, "report", "devices")).Length, Directory.GetFiles(Path.Combine(folder, "devices")).Length);

        var index = Text(Path.Combine(folder, "index.html"));
        Assert.Contains("Decision rule: guarded (guarded acceptance and rejection, ILAC-G8:09/2019), guard band w = U", index);
        Assert.Contains("with decision_rule = guarded for this copy", index);

        // IEC 60898-1 Table 7 b: the device that held 1.45 In for the full hour is too late as written; held 3600 s is
        // 0 s past the limit, inside w = U = 2 x (0.005 x 3600 + 0.010) / √3 = 20.80 s, so guarded withholds the failure.
        var q03 = Text(Path.Combine(folder, "devices", "BPS-DB1-Q03.html"));
        Assert.Contains("Decision rule: guarded acceptance and rejection, guard band w = U (guarded, ILAC-G8:09/2019).", q03);
        Assert.Contains("not-assessable (U = 20.8 s; U(I) = 0.538 A): within the measurement uncertainty of the limit: held 3600 s is 0.0 s past the 3600 s maximum", q03);
        Assert.Contains("simple acceptance would say too late", q03);

        // The same test in the simple report stays too late, with the same U beside it.
        var simple = Text(Path.Combine(fleet.Folder, "report", "devices", "BPS-DB1-Q03.html"));
        Assert.Contains("too-late (U = 20.8 s; U(I) = 0.538 A)", simple);
    }

    [Fact]
    public void UnderNonBinary_EachVerdictCarriesItsStatementOfConformity()
    {
        var folder = Path.Combine(fleet.Folder, "report-non-binary");
        var policy = Path.Combine(fleet.Folder, "non-binary.conf");
        File.WriteAllText(policy, "require_registered_instruments = yes\ndecision_rule = non-binary\n");

        Assert.Equal(0, CliRun.Run("report", "--db", fleet.Database, "--policy", policy, "--asset", "BPS-DB1-Q03", "--out", folder).Exit);

        // ILAC-G8:09/2019 (non-binary statements): outside the limit by less than w is a conditional fail; inside by more than w, a pass.
        var page = Text(Path.Combine(folder, "devices", "BPS-DB1-Q03.html"));
        Assert.Contains("too-late (U = 20.8 s; U(I) = 0.538 A; conditional-fail)", page);
        Assert.Matches(PassStatement(), page);
        Assert.Contains("non-binary statements (pass, conditional pass, conditional fail, fail), guard band w = U (non-binary, ILAC-G8:09/2019)", page);
    }

    [Fact]
    public void TheWorksheet_UnderGuarded_ShowsTheGuardedWindowBesideThePlainOne()
    {
        var folder = Path.Combine(fleet.Folder, "worksheet-guarded");
        var policy = Path.Combine(fleet.Folder, "guarded.conf");
        File.WriteAllText(policy, "decision_rule = guarded\n");

        Assert.Equal(0, CliRun.Run("worksheet", "--db", fleet.Database, "--policy", policy, "--asset", "ARW-DB1-Q01", "--out", folder).Exit);

        var page = Text(Path.Combine(folder, "worksheet.html"));
        Assert.Contains("Decision rule: guarded (ILAC-G8:09/2019), guard band w = U.", page);

        // IEC 60898-1 Table 7 b, t < 1 h: w = 2 x (0.005 x 3600 + 0.010) / √3 = 20.80 s, so a pass needs a trip before
        // 3579.2 s, written 59 min 39 s (rounded down, the safe way for a maximum).
        Assert.Contains("trip before 1 h guarded: trip before 59 min 39 s (w = 20.8 s at the maximum)", page);

        // Table 7 e on a B6, t < 0.1 s, a limit that does not move with current: w = 2 x (0.005 x 0.1 + 0.010) / √3 =
        // 0.01212 s, so a pass needs a trip before 0.0879 s, written 0.087 s.
        Assert.Contains("trip before 100 ms guarded: trip before 0.087 s (w = 0.013 s at the maximum)", page);

        // Row a's hour must be outlasted by the guard band on the time held: held = 3600 + 2 (0.005 held + 0.010) / √3,
        // 3620.92 s, written 60 min 21 s (rounded up, the safe way for a hold); and a guarded result has a third box.
        Assert.Contains("no trip within 1 h guarded: hold at least 60 min 21 s (w = 21 s on the time held)", page);
        Assert.Contains("pass ☐ within U ☐ fail", page);

        // Under simple acceptance (the default) the worksheet shows the plain windows only.
        var plain = Path.Combine(fleet.Folder, "worksheet-plain");
        Assert.Equal(0, CliRun.Run("worksheet", "--db", fleet.Database, "--asset", "ARW-DB1-Q01", "--out", plain).Exit);
        Assert.DoesNotContain("guarded", Text(Path.Combine(plain, "worksheet.html")), StringComparison.Ordinal);
    }

    [Fact]
    public async Task TheGuardedDevicePage_ShowsTheRuleInABrowser_WithoutConsoleErrors()
    {
        Assert.True(File.Exists(Chromium), $"{Chromium} is missing: install Debian's chromium package (apt-get install -y chromium), as .ci/run does");
        using var playwright = await Playwright.CreateAsync();
        await using var browser = await playwright.Chromium.LaunchAsync(new() { ExecutablePath = Chromium, Headless = true, Args = ["--no-sandbox"] });
        var tab = await browser.NewPageAsync();
        var errors = new List<string>();
        tab.Console += (_, m) =>
        {
            if (m.Type == "error")
            {
                errors.Add(m.Text);
            }
        };

        await tab.GotoAsync(new Uri(Path.Combine(fleet.Folder, "report-guarded", "devices", "BPS-MSB-F01.html")).AbsoluteUri);

        Assert.StartsWith("Decision rule: guarded", (await tab.Locator("p.rule").InnerTextAsync()).Trim(), StringComparison.Ordinal);
        var verdicts = await tab.Locator("table.trips tbody tr td:nth-child(5)").AllInnerTextsAsync();
        Assert.NotEmpty(verdicts);
        Assert.All(verdicts, v => Assert.Matches(WithU(), v));
        Assert.Contains(verdicts, v => v.StartsWith("not-assessable", StringComparison.Ordinal));
        Assert.Empty(errors);
    }

    // The page's text, tags dropped and entities decoded, whitespace run together.
    private static string Text(string file)
    {
        var html = File.ReadAllText(file);
        var text = WebUtility.HtmlDecode(Tags().Replace(Svg().Replace(html, " "), " "));
        return Spaces().Replace(text, " ");
    }

    [GeneratedRegex(@"<svg.*?</svg>", RegexOptions.Singleline)]
    private static partial Regex Svg();

    [GeneratedRegex(@"<[^>]+>")]
    private static partial Regex Tags();

    [GeneratedRegex(@"\s+")]
    private static partial Regex Spaces();

    [GeneratedRegex(@"pass \(U = [0-9.]+ s; U\(I\) = [0-9.]+ A; pass\)")]
    private static partial Regex PassStatement();

    [GeneratedRegex(@"^(pass|too-early|too-late|not-assessable) \(U = [0-9.]+ s; U\(I\) = [0-9.]+ A\)")]
    private static partial Regex WithU();
}
