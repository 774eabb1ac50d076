using TripTestLog.Application.Findings;

namespace TripTestLog.Application.Reports;

/// <summary>Takes each device of a report as the pipeline hands it over: its page, its rows in the data files.</summary>
public interface IDeviceReportSink
{
    /// <summary>Takes one device, in asset-tag order, on the pipeline's writing side.</summary>
    void Add(DeviceReport device);
}
