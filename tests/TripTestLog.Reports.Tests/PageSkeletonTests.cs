using TripTestLog.Application.Findings;

namespace TripTestLog.Reports.Tests;

/// <summary>
/// The report pages keep their structure (sections, headings, table columns, the classes the style sheet and print rely
/// on) as stored in golden/*.skeleton.txt, from the same invented devices the page tests write. A change there is
/// reviewed like code: run with UPDATE_GOLDEN=1 and read the diff.
/// </summary>
public sealed class PageSkeletonTests
{
    [Fact]
    public void TheDevicePage_KeepsItsStoredSkeleton() =>
        GoldenFile.Matches("device-page.skeleton.txt", HtmlSkeleton.Of(DevicePageTests.Page(FindingPolicy.Default)));

    [Fact]
    public void TheFleetPage_KeepsItsStoredSkeleton() =>
        GoldenFile.Matches("fleet-page.skeleton.txt", HtmlSkeleton.Of(FleetPageTests.Page()));

    [Fact]
    public void ASkeleton_KeepsTagsIdsClassesHeadingsAndColumnHeaders_AndLeavesOutDataChartsAndStyles()
    {
        const string page = """
            <!DOCTYPE html>
            <html><head><meta charset="utf-8"><style>h1 { color: red; }</style></head><body>
            <h1>C-16 &#8212; Way 1</h1><p class="sub small">as of 2026-12-01 09:00</p>
            <section id="trips"><h2>Trip <em>tests</em></h2>
            <table><thead><tr><th>at 20 &#176;C</th></tr></thead><tbody><tr><td><a href="x.html">40.9 A</a></td></tr></tbody></table>
            <figure><svg viewBox="0 0 4 4"><svg><text>1 s</text></svg><rect/></svg><figcaption>Diamond ring</figcaption></figure>
            <!-- <h2>not a heading</h2> --><br></section></body></html>
            """;

        Assert.Equal(
            """
            html
              head
                meta
                style
              body
                h1 "C-16 — Way 1"
                p.sub.small
                section#trips
                  h2 "Trip tests"
                    em
                  table
                    thead
                      tr
                        th "at 20 °C"
                    tbody
                      tr
                        td
                          a
                  figure
                    svg
                    figcaption
                  br

            """.ReplaceLineEndings("\n"),
            HtmlSkeleton.Of(page.ReplaceLineEndings("\n")));
    }

    [Fact]
    public void AnElementClosedOutOfOrder_IsRefused_NotGuessedAt() =>
        Assert.Throws<FormatException>(() => HtmlSkeleton.Of("<div><p>text</div></p>"));

    [Fact]
    public void AMismatch_IsReportedAtItsFirstDifferingLine()
    {
        var difference = GoldenFile.FirstDifference("html\n  body\n    h1 \"Fleet condition\"\n", "html\n  body\n    h1 \"Fleet state\"\n");

        Assert.Equal("differs at line 3:\n  expected:     h1 \"Fleet condition\"\n  actual:       h1 \"Fleet state\"", difference);
        Assert.Null(GoldenFile.FirstDifference("html\n", "html\n"));
    }
}
