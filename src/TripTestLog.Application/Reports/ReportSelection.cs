using TripTestLog.Domain.Devices;

namespace TripTestLog.Application.Reports;

/// <summary>What a report includes.</summary>
/// <param name="Site">Only this site's devices (compared without case), or all.</param>
/// <param name="Only">Only this device, or all.</param>
/// <param name="From">Trip tests shown from this date (each is still judged with its whole history).</param>
/// <param name="To">Trip tests shown up to this date.</param>
/// <param name="DevicePages">Whether a page is written per device.</param>
public sealed record ReportSelection(string? Site, AssetTag? Only, DateOnly? From, DateOnly? To, bool DevicePages)
{
    /// <summary>Everything, with a page per device.</summary>
    public static ReportSelection All { get; } = new(null, null, null, null, true);

    /// <summary>The filter in words for the fleet page, e.g. ", site X, tests from 2026-01-01"; empty for everything.</summary>
    public string Describe => (Site is null ? "" : $", site {Site}") + (Only is { } t ? $", device {t}" : "")
        + (From is { } f ? $", tests from {f:yyyy-MM-dd}" : "") + (To is { } to ? $", tests to {to:yyyy-MM-dd}" : "");
}
