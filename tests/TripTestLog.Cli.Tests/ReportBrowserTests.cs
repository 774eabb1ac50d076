using Microsoft.Playwright;

namespace TripTestLog.Cli.Tests;

/// <summary>
/// The report in a real headless browser: Debian's Chromium (installed by .ci/run), driven by Playwright, which never
/// downloads a browser of its own. Each page must render its charts and log no error. UPDATE_SCREENSHOTS=1 rewrites the
/// screenshots under docs/.
/// </summary>
public sealed class ReportBrowserTests(SampleFleetDatabase fleet) : IClassFixture<SampleFleetDatabase>
{
    private const string Chromium = "/usr/bin/chromium";

    [Theory]
    [InlineData("index.html", "devices", "report-fleet.png")]
    [InlineData("devices/BPS-DB1-Q03.html", "trip time", "report-device.png")]
    [InlineData("devices/ARW-DB2-Q02.html", "contact resistance at 20 °C, µΩ", null)]
    public async Task APage_RendersItsCharts_WithoutConsoleErrors(string page, string chartText, string? screenshot)
    {
        Assert.True(File.Exists(Chromium), $"{Chromium} is missing: install Debian's chromium package (apt-get install -y chromium), as .ci/run does");
        var folder = Path.Combine(fleet.Folder, "report-browser");
        if (!File.Exists(Path.Combine(folder, "index.html")))
        {
            Assert.Equal(0, CliRun.Run("report", "--db", fleet.Database, "--out", folder).Exit);
        }

        using var playwright = await Playwright.CreateAsync();
        await using var browser = await Launch(playwright);
        var (tab, errors) = await Open(browser);
        var requests = new List<string>();
        tab.Request += (_, request) => requests.Add(request.Url);

        await tab.GotoAsync(new Uri(Path.Combine(folder, page)).AbsoluteUri);

        Assert.True(await tab.Locator("svg").CountAsync() >= 1);
        var texts = await tab.Locator("svg text").AllTextContentsAsync();
        Assert.Contains(texts, t => t.Trim() == chartText);
        Assert.Contains("Caution:", await tab.Locator("p.caution").InnerTextAsync());
        Assert.Empty(errors);
        Assert.All(requests, url => Assert.StartsWith("file://", url));

        // The screenshot shows the page as it prints (the print style sheet), the way a technician signs it.
        // A 960 x 680 view keeps each picture under about 300 KB for the docs.
        await tab.EmulateMediaAsync(new() { Media = Media.Print });
        await tab.SetViewportSizeAsync(960, 680);
        var png = await tab.ScreenshotAsync(new() { FullPage = false });
        Assert.True(png.Length > 20_000, "the screenshot is nearly empty");
        if (screenshot is not null && Environment.GetEnvironmentVariable("UPDATE_SCREENSHOTS") == "1")
        {
            await File.WriteAllBytesAsync(Path.Combine(Golden.RepositoryRoot(), "docs", screenshot), png);
        }
    }

    [Theory]
    [InlineData("devices/CWD-DB1-Q06.html")]
    [InlineData("devices/BPS-DB1-Q03.html")]
    public async Task NoLegendOrLabel_OnADevicePage_CoversAChartsDataArea(string page)
    {
        // Each chart carries its data area (data-plot-area, in its own units); the browser lays out every text of the
        // chart, and none may fall inside that area: the legends sit beside the data, so a crossing is never hidden.
        var folder = Path.Combine(fleet.Folder, "report-legends");
        if (!File.Exists(Path.Combine(folder, "index.html")))
        {
            Assert.Equal(0, CliRun.Run("report", "--db", fleet.Database, "--out", folder).Exit);
        }

        using var playwright = await Playwright.CreateAsync();
        await using var browser = await Launch(playwright);
        var (tab, errors) = await Open(browser);
        await tab.GotoAsync(new Uri(Path.Combine(folder, page)).AbsoluteUri);

        var overlaps = await tab.EvaluateAsync<string[]>("""
            () => [...document.querySelectorAll('svg[data-plot-area]')].flatMap((svg, i) => {
              const [x, y, w, h] = svg.dataset.plotArea.split(' ').map(Number);
              return [...svg.querySelectorAll('text')].filter(t => t.textContent.trim() !== '').map(t => [t, t.getBBox()])
                .filter(([t, b]) => b.x < x + w - 1 && b.x + b.width > x + 1 && b.y < y + h - 1 && b.y + b.height > y + 1)
                .map(([t, b]) => `chart ${i + 1}: "${t.textContent.trim()}"`);
            })
            """);
        var charts = await tab.Locator("svg[data-plot-area]").CountAsync();
        var legendTexts = await tab.Locator("svg text").AllTextContentsAsync();

        Assert.True(charts >= 3, $"{page} has {charts} charts");
        Assert.Contains(legendTexts, t => t.Trim().StartsWith("latest allowed", StringComparison.Ordinal));
        Assert.Empty(overlaps);
        Assert.Empty(errors);
    }

    [Fact]
    public async Task TheWorksheet_RendersItsTables_WithoutConsoleErrors_AndPrintsAPagePerDevice()
    {
        Assert.True(File.Exists(Chromium), $"{Chromium} is missing: install Debian's chromium package (apt-get install -y chromium), as .ci/run does");
        var folder = Path.Combine(fleet.Folder, "worksheet-browser");
        Assert.Equal(0, CliRun.Run("worksheet", "--db", fleet.Database, "--site", "Alder Ridge Works", "--out", folder).Exit);

        using var playwright = await Playwright.CreateAsync();
        await using var browser = await Launch(playwright);
        var (tab, errors) = await Open(browser);

        await tab.GotoAsync(new Uri(Path.Combine(folder, "worksheet.html")).AbsoluteUri);

        Assert.Contains("Caution:", await tab.Locator("p.caution").InnerTextAsync());
        Assert.Equal(24, await tab.Locator("section.device-page").CountAsync());
        var q05 = tab.Locator("section.device-page", new() { HasText = "ARW-DB1-Q05" });
        Assert.Equal(6, await q05.Locator("table.worksheet").First.Locator("tbody tr").CountAsync());
        Assert.Empty(errors);

        // Printed, each device starts a page of its own.
        var pdf = await tab.PdfAsync(new() { Format = "A4" });
        Assert.True(CountPages(pdf) >= 24, "fewer printed pages than devices");

        // The screenshot shows the page as it prints (the print style sheet), the way a technician signs it.
        // A 960 x 680 view keeps each picture under about 300 KB for the docs.
        await tab.EmulateMediaAsync(new() { Media = Media.Print });
        await tab.SetViewportSizeAsync(960, 680);
        var png = await tab.ScreenshotAsync(new() { FullPage = false });
        Assert.True(png.Length > 20_000, "the screenshot is nearly empty");
        if (Environment.GetEnvironmentVariable("UPDATE_SCREENSHOTS") == "1")
        {
            await File.WriteAllBytesAsync(Path.Combine(Golden.RepositoryRoot(), "docs", "worksheet.png"), png);
        }
    }

    private static Task<IBrowser> Launch(IPlaywright playwright) =>
        playwright.Chromium.LaunchAsync(new() { ExecutablePath = Chromium, Headless = true, Args = ["--no-sandbox"] });

    // A tab that collects every console error and uncaught page error.
    private static async Task<(IPage Tab, List<string> Errors)> Open(IBrowser browser)
    {
        var tab = await browser.NewPageAsync(new() { ViewportSize = new() { Width = 1200, Height = 1500 } });
        var errors = new List<string>();
        tab.Console += (_, message) =>
        {
            if (message.Type == "error")
            {
                errors.Add(message.Text);
            }
        };
        tab.PageError += (_, error) => errors.Add(error);
        return (tab, errors);
    }

    // Each page of a PDF is one "/Type /Page" object (the tree's root is "/Type /Pages").
    private static int CountPages(byte[] pdf)
    {
        var text = System.Text.Encoding.Latin1.GetString(pdf);
        return System.Text.RegularExpressions.Regex.Matches(text, @"/Type\s*/Page(?!s)").Count;
    }
}
