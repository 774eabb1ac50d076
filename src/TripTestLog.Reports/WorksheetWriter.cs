using System.Text;
using TripTestLog.Application.Worksheet;
using TripTestLog.Domain.Verdicts;
using TripTestLog.Reports.Html;

namespace TripTestLog.Reports;

/// <summary>
/// Writes the printable worksheet page as devices stream past: the shared frame with the caution, then one section per
/// device (a printed page each), written out as soon as it is built so the page never sits whole in memory.
/// </summary>
public sealed class WorksheetWriter
{
    private readonly TextWriter _output;
    private readonly DecisionPolicy _decision;
    private int _devices;

    /// <summary>
    /// Starts the page on <paramref name="output"/>; under a guarded <paramref name="decision"/> rule each trip window is
    /// shown with the guard-banded window beside it.
    /// </summary>
    public WorksheetWriter(TextWriter output, string title, string subtitle, DecisionPolicy? decision = null)
    {
        ArgumentNullException.ThrowIfNull(output);
        _output = output;
        _decision = decision ?? DecisionPolicy.Default;
        var html = new StringBuilder();
        Layout.Begin(html, title, subtitle, back: null);
        html.Append("<p class=\"small\">").Append(Markup.H(WorksheetSection.HowToUse)).Append("</p>\n");
        if (WorksheetSection.GuardedNote(_decision) is { } note)
        {
            html.Append("<p class=\"small rule\">").Append(Markup.H(note)).Append("</p>\n");
        }
        _output.Write(html);
    }

    /// <summary>How many devices the page holds so far.</summary>
    public int Devices => _devices;

    /// <summary>Adds one device's section.</summary>
    public void Add(DeviceWorksheet sheet)
    {
        _output.Write(WorksheetSection.Write(sheet, _decision));
        _devices++;
    }

    /// <summary>Ends the page with <paramref name="footer"/>.</summary>
    public void Finish(string footer)
    {
        var html = new StringBuilder();
        Layout.End(html, footer);
        _output.Write(html);
        _output.Flush();
    }
}
