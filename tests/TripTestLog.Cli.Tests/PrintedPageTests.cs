using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;
using Microsoft.Playwright;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// Each page type printed to PDF by a real Chromium (Playwright's <c>PdfAsync</c>) on A4 and on US Letter, its sheets
/// counted by poppler's <c>pdfinfo</c> and its text read back page by page with <c>pdftotext</c> (Debian's
/// poppler-utils, installed by .ci/run). The sheet limits are the ones a technician signs and files: a device page on
/// one or two sheets (three for a device with six years of history), a worksheet sheet per device.
/// </summary>
public sealed partial class PrintedPageTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    private const string Chromium = "/usr/bin/chromium";

    public static TheoryData<string, string, int> Pages => new()
    {
        // Twelve trip tests over the years, contact and insulation history, findings and the sign-off.
        { "devices/ARW-MCC-Q01.html", "A4", 2 },
        { "devices/ARW-MCC-Q01.html", "Letter", 3 },
        // Thirty-one trip tests on six dates and twelve insulation readings.
        { "devices/BPS-DB1-Q03.html", "A4", 3 },
        { "devices/BPS-DB1-Q03.html", "Letter", 3 },
        { "index.html", "A4", 3 },
        { "index.html", "Letter", 3 },
    };

    [Theory]
    [MemberData(nameof(Pages))]
    public async Task AReportPage_PrintsOnFewSheets_WithNoHeadingLeftAtAPageFoot(string page, string paper, int mostSheets)
    {
        var folder = Report();
        var pdf = await Print(new Uri(Path.Combine(folder, page)).AbsoluteUri, paper, async tab =>
        {
            var headings = await tab.Locator("h2, h3").AllInnerTextsAsync();
            return headings.Select(h => h.Trim()).ToHashSet(StringComparer.Ordinal);
        });

        var sheets = Sheets(pdf.File);
        Assert.InRange(sheets, 1, mostSheets);
        AssertNoStrandedHeading(pdf.File, sheets, pdf.Headings);
        var last = PageText(pdf.File, sheets);
        if (page.StartsWith("devices/", StringComparison.Ordinal))
        {
            // The sign-off sits with the instruments table and carries the trace once, on the last sheet.
            Assert.Contains("Tested by", last, StringComparison.Ordinal);
            Assert.Contains("Instruments", last, StringComparison.Ordinal);
            Assert.Single(Regex.Matches(AllText(pdf.File), "findings as of .*; policy:"));
        }
        else
        {
            // The fleet page opens with what to act on: the priority list is on the first sheet, above the site table.
            var first = PageText(pdf.File, 1);
            Assert.Contains("Act first", first, StringComparison.Ordinal);
            Assert.True(first.IndexOf("Act first", StringComparison.Ordinal) < AllText(pdf.File).IndexOf("Devices by site", StringComparison.Ordinal));
        }
    }

    [Theory]
    [InlineData("A4")]
    [InlineData("Letter")]
    public async Task TheWorksheet_PrintsOneSheetPerDevice(string paper)
    {
        var folder = Path.Combine(fleet.Folder, "worksheet-print-" + paper);
        Assert.Equal(0, CliRun.Run("worksheet", "--db", fleet.Database, "--site", "Alder Ridge Works", "--out", folder).Exit);

        var pdf = await Print(new Uri(Path.Combine(folder, "worksheet.html")).AbsoluteUri, paper, async tab =>
        {
            var headings = await tab.Locator("h3").AllInnerTextsAsync();
            return headings.Select(h => h.Trim()).ToHashSet(StringComparer.Ordinal);
        });

        var sheets = Sheets(pdf.File);
        Assert.Equal(24, sheets);
        AssertNoStrandedHeading(pdf.File, sheets, pdf.Headings);
        for (var i = 1; i <= sheets; i++)
        {
            var text = PageText(pdf.File, i);
            Assert.Contains("Tested by", text, StringComparison.Ordinal);
            Assert.Contains("Insulation resistance", text, StringComparison.Ordinal);
        }
    }

    [Fact]
    public async Task GradeBadges_HaveTheGradeChartsColours_AndPassWcagAaContrast()
    {
        var folder = Report();
        using var playwright = await Playwright.CreateAsync();
        await using var browser = await playwright.Chromium.LaunchAsync(new() { ExecutablePath = Chromium, Headless = true, Args = ["--no-sandbox"] });
        var tab = await browser.NewPageAsync();
        await tab.GotoAsync(new Uri(Path.Combine(folder, "index.html")).AbsoluteUri);

        var badges = await tab.Locator("span.grade").EvaluateAllAsync<string[][]>(
            "els => els.map(e => { const s = getComputedStyle(e); return [e.textContent, s.color, s.backgroundColor]; })");
        Assert.NotEmpty(badges);
        Assert.Contains(badges, b => b[2] != "rgba(0, 0, 0, 0)");
        foreach (var badge in badges)
        {
            // WCAG 2.1 success criterion 1.4.3 (AA): at least 4.5:1 for text of ordinary size.
            var ratio = Contrast(Rgb(badge[1]), Rgb(badge[2]));
            Assert.True(ratio >= 4.5, $"the '{badge[0]}' badge has contrast {ratio:0.00}:1, below 4.5:1");
        }
    }

    private string Report()
    {
        var folder = Path.Combine(fleet.Folder, "report-print");
        if (!File.Exists(Path.Combine(folder, "index.html")))
        {
            Assert.Equal(0, CliRun.Run("report", "--db", fleet.Database, "--out", folder).Exit);
        }

        return folder;
    }

    private async Task<(string File, HashSet<string> Headings)> Print(string url, string paper, Func<IPage, Task<HashSet<string>>> headings)
    {
        Assert.True(File.Exists(Chromium), $"{Chromium} is missing: install Debian's chromium package (apt-get install -y chromium), as .ci/run does");
        using var playwright = await Playwright.CreateAsync();
        await using var browser = await playwright.Chromium.LaunchAsync(new() { ExecutablePath = Chromium, Headless = true, Args = ["--no-sandbox"] });
        var tab = await browser.NewPageAsync();
        await tab.GotoAsync(url);
        var file = Path.Combine(fleet.Folder, $"print-{Guid.NewGuid():N}.pdf");
        await tab.PdfAsync(new() { Format = paper, Path = file });
        return (file, await headings(tab));
    }

    // A heading that is the last line of a sheet has been parted from what it heads.
    private static void AssertNoStrandedHeading(string pdf, int sheets, HashSet<string> headings)
    {
        for (var i = 1; i < sheets; i++)
        {
            var lines = PageText(pdf, i).Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
            Assert.False(lines.Length > 0 && headings.Contains(lines[^1]), $"sheet {i} ends with the heading '{(lines.Length > 0 ? lines[^1] : "")}'");
        }
    }

    private static int Sheets(string pdf)
    {
        var info = Poppler("pdfinfo", pdf);
        var match = PagesLine().Match(info);
        Assert.True(match.Success, "pdfinfo printed no page count: " + info);
        return int.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture);
    }

    private static string PageText(string pdf, int page) => Poppler("pdftotext", "-f", page.ToString(CultureInfo.InvariantCulture),
        "-l", page.ToString(CultureInfo.InvariantCulture), pdf, "-");

    private static string AllText(string pdf) => Poppler("pdftotext", pdf, "-");

    private static string Poppler(string tool, params string[] args)
    {
        var start = new ProcessStartInfo(tool) { RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in args)
        {
            start.ArgumentList.Add(a);
        }

        Process process;
        try
        {
            process = Process.Start(start)!;
        }
        catch (System.ComponentModel.Win32Exception)
        {
            Assert.Fail($"{tool} is missing: install Debian's poppler-utils (apt-get install -y poppler-utils), as .ci/run does");
            throw;
        }

        using (process)
        {
            var output = process.StandardOutput.ReadToEnd();
            process.WaitForExit();
            Assert.Equal(0, process.ExitCode);
            return output;
        }
    }

    private static (double R, double G, double B) Rgb(string css)
    {
        var m = RgbValue().Match(css);
        Assert.True(m.Success, "not an rgb() colour: " + css);
        return (double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture), double.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture),
            double.Parse(m.Groups[3].Value, CultureInfo.InvariantCulture));
    }

    // WCAG 2.1, definitions of relative luminance and contrast ratio.
    private static double Contrast((double R, double G, double B) a, (double R, double G, double B) b)
    {
        static double Channel(double c) => (c /= 255) <= 0.04045 ? c / 12.92 : Math.Pow((c + 0.055) / 1.055, 2.4);
        static double Luminance((double R, double G, double B) c) => 0.2126 * Channel(c.R) + 0.7152 * Channel(c.G) + 0.0722 * Channel(c.B);
        var (la, lb) = (Luminance(a), Luminance(b));
        return (Math.Max(la, lb) + 0.05) / (Math.Min(la, lb) + 0.05);
    }

    [GeneratedRegex(@"Pages:\s+(\d+)")]
    private static partial Regex PagesLine();

    [GeneratedRegex(@"rgba?\((\d+(?:\.\d+)?),\s*(\d+(?:\.\d+)?),\s*(\d+(?:\.\d+)?)")]
    private static partial Regex RgbValue();
}
