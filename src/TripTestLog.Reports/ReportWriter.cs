using TripTestLog.Application.Findings;
using TripTestLog.Reports.Html;

namespace TripTestLog.Reports;

/// <summary>
/// Writes a report folder as device conditions stream past: one self-contained page per device in <c>devices/</c>
/// (inline styles and SVG charts, no network fetch), written one after another as each device arrives, and the fleet
/// page <c>index.html</c> at the end from the bounded fleet lists.
/// </summary>
public sealed class ReportWriter
{
    private readonly string _folder;
    private readonly ReportContext _context;
    private readonly bool _devicePages;
    private readonly FleetReport _fleet;
    private int _pages;

    /// <summary>Starts a report in <paramref name="folder"/> (created if missing); <paramref name="devicePages"/> writes a page per device.</summary>
    public ReportWriter(string folder, ReportContext context, bool devicePages)
    {
        _folder = folder;
        _context = context;
        _devicePages = devicePages;
        _fleet = new FleetReport(30) { Models = new FleetModels(context.Policy, context.AsOf) };
        Directory.CreateDirectory(Path.Combine(folder, "devices"));
    }

    /// <summary>How many device pages were written.</summary>
    public int DevicePages => _pages;

    /// <summary>Takes one device: its page, and its place in the fleet lists.</summary>
    public void Add(DeviceReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        _fleet.Add(report);
        if (_devicePages)
        {
            var tag = report.Condition.Device.Tag.Value;
            var page = Markup.PageName(tag);
            CompletedFile.WriteAllText(Path.Combine(_folder, "devices", page), DevicePage.Write(report, _context));
            _pages++;
        }
    }

    /// <summary>Writes the fleet page and returns its path; <paramref name="selection"/> describes a filter, e.g. ", site X".</summary>
    public string Finish(string selection = "")
    {
        var path = Path.Combine(_folder, "index.html");
        // Every device on the fleet page went through Add, so it has a page exactly when device pages are written.
        CompletedFile.WriteAllText(path, FleetPage.Write(_fleet, _context, tag => _devicePages ? Markup.PageName(tag) : null, selection));
        return path;
    }
}
