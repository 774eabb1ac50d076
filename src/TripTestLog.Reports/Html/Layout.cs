using System.Text;
using static TripTestLog.Reports.Html.Markup;

namespace TripTestLog.Reports.Html;

/// <summary>The frame every page shares: inline styles (screen and print), the title, the caution and what the bands rest on.</summary>
internal static class Layout
{
    public const string Caution =
        "Caution: primary-injection and insulation testing involve high currents and voltages and arc-flash hazard. Isolate, prove dead, "
        + "lock out and tag out; wear arc-rated PPE; let only qualified staff operate test sets. These results support decisions; they do "
        + "not replace the manufacturer's data, local codes and regulations, or licensed engineering practice.";

    public const string Basis =
        "Trip-time bands rest on the device's standard (IEC 60898-1 Table 7; IEC 60947-2 settings and tolerances; IEC 60255-151 or "
        + "IEEE C37.112 curves), its settings in the register or read off it at the test, and the lab policy where a standard leaves a "
        + "figure to the maker or the lab. A failure rests only on a guaranteed edge; drawn (typical) edges raise advisories only.";

    private const string Styles = """
        :root { --ink: #1f2421; --muted: #5b615d; --line: #c9cfc9; --band: #eef3ec; --act: #a4161a; --plan: #b5651d; --ok: #4f772d; }
        * { box-sizing: border-box; }
        body { font-family: "DejaVu Sans", Verdana, sans-serif; color: var(--ink); margin: 0 auto; max-width: 1100px; padding: 16px 24px; font-size: 14px; line-height: 1.45; }
        h1 { font-size: 22px; margin: 8px 0 4px; } h2 { font-size: 17px; margin: 24px 0 8px; border-bottom: 2px solid var(--line); padding-bottom: 2px; }
        h3 { font-size: 15px; margin: 16px 0 6px; }
        .sub { color: var(--muted); margin: 0 0 12px; }
        .caution { border: 2px solid var(--act); padding: 8px 12px; margin: 12px 0; font-size: 13px; }
        .basis { background: var(--band); padding: 8px 12px; font-size: 13px; }
        table { border-collapse: collapse; width: 100%; margin: 6px 0 12px; font-size: 13px; }
        th, td { border-bottom: 1px solid var(--line); padding: 4px 6px; text-align: left; vertical-align: top; }
        th { background: #f4f6f4; }
        td.num { text-align: right; font-variant-numeric: tabular-nums; }
        td.none { color: var(--muted); font-style: italic; }
        .verdict-too-early, .verdict-too-late { color: var(--act); font-weight: bold; }
        .verdict-not-assessable { color: var(--muted); font-style: italic; }
        .grade { font-weight: bold; padding: 1px 6px; border: 1px solid var(--ink); border-radius: 3px; white-space: nowrap; }
        .sev-out-of-service, .sev-act { color: var(--act); font-weight: bold; } .sev-plan { color: var(--plan); font-weight: bold; }
        .closed { color: var(--muted); }
        figure { margin: 8px 0 16px; } figure svg { max-width: 100%; height: auto; } figcaption { color: var(--muted); font-size: 12px; }
        .charts { display: flex; flex-wrap: wrap; gap: 8px; } .charts figure { flex: 0 1 400px; }
        .signoff td { height: 2.2em; } .signoff th { width: 22%; }
        td.entry { min-width: 7em; height: 2.2em; border: 1px solid var(--ink); background: #fff; }
        .small { color: var(--muted); font-size: 12px; } .tick { white-space: nowrap; font-size: 12px; }
        nav a { margin-right: 12px; }
        footer { color: var(--muted); font-size: 12px; margin-top: 24px; border-top: 1px solid var(--line); padding-top: 6px; }
        .grade-sound { background: #4f772d; color: #fff; } .grade-watch { background: #90a955; }
        .grade-plan-work { background: #e9c46a; } .grade-repair { background: #e76f51; }
        .grade-take-out-of-service { background: #a4161a; color: #fff; } .grade-untested { background: #eceeed; }
        @media print { .grade { -webkit-print-color-adjust: exact; print-color-adjust: exact; } }
        table.register td:nth-child(odd) { width: 16%; color: var(--muted); } table.register td:nth-child(even) { width: 34%; }
        .src { overflow-wrap: anywhere; }
        @page { margin: 12mm 10mm; }
        @media print {
          body { max-width: none; padding: 0; font-size: 9.5px; line-height: 1.3; } nav { display: none; }
          h1 { font-size: 15px; margin: 0 0 2px; } h2 { font-size: 12px; margin: 8px 0 3px; } h3 { font-size: 10.5px; margin: 6px 0 2px; }
          h2, h3, h2 + .sub { break-after: avoid; break-inside: avoid; }
          h2::after, h3::after { content: ""; display: block; height: 28mm; margin-bottom: -28mm; } .caution, .basis { font-size: 8px; padding: 3px 6px; margin: 4px 0; } .sub { margin: 0 0 4px; }
          table { font-size: 8px; margin: 2px 0 6px; } th, td { padding: 1px 3px; } thead { display: table-header-group; }
          figure, tr, .keep { break-inside: avoid; } figure { margin: 2px 0 6px; } figcaption { font-size: 7.5px; }
          section.device-page ~ section.device-page { break-before: page; }
          figure.wide svg { max-height: 70mm; width: auto; } figure.wide { text-align: center; }
          .charts { gap: 4px; } .charts figure { flex: 0 1 32%; max-width: 33%; } figure.contact svg { max-height: 55mm; }
          table.trips { font-size: 7.5px; } table.trips td { white-space: nowrap; } table.trips td:nth-child(5) { white-space: normal; }
          td.entry { height: 1.9em; } .signoff td { height: 1.9em; }
          .small, .tick { font-size: 7px; }
          footer { margin-top: 8px; padding-top: 3px; font-size: 8px; }
        }
        """;

    public static void Begin(StringBuilder html, string title, string subtitle, string? back)
    {
        html.Append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">")
            .Append("<title>").Append(H(title)).Append("</title><style>").Append(Styles).Append("</style></head><body>\n");
        if (back is not null)
        {
            html.Append("<nav><a href=\"").Append(H(back)).Append("\">Fleet page</a></nav>\n");
        }

        html.Append("<h1>").Append(H(title)).Append("</h1><p class=\"sub\">").Append(H(subtitle)).Append("</p>\n");
        html.Append("<p class=\"caution\">").Append(H(Caution)).Append("</p>\n");
        html.Append("<p class=\"basis\">").Append(H(Basis)).Append("</p>\n");
    }

    /// <summary>Closes the page; a null <paramref name="footer"/> writes none (a page whose sign-off already carries it).</summary>
    public static void End(StringBuilder html, string? footer)
    {
        if (footer is not null)
        {
            html.Append("<footer>").Append(H(footer)).Append("</footer>\n");
        }

        html.Append("</body></html>\n");
    }
}
