using System.Reflection;
using TripTestLog.Application.Findings;
using TripTestLog.Application.Reports;
using TripTestLog.Application.Stores;
using TripTestLog.Cli.Output;
using TripTestLog.Reports;

namespace TripTestLog.Cli.Services;

/// <summary>
/// The files of one report: the pages (<see cref="ReportWriter"/>) and the data files beside them (findings and
/// verdicts as CSV and JSON), fed device by device by <see cref="ReportPipeline"/>. Each data file is written as
/// NAME.partial and renamed only when the run completes.
/// </summary>
internal static class ReportRun
{
    /// <summary>The tool's version, as every page prints it.</summary>
    public static string ToolVersion =>
        typeof(ReportRun).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "unknown";

    /// <summary>
    /// Writes the report into <paramref name="folder"/> and returns the fleet page's path and the number of device pages;
    /// <paramref name="alsoEach"/>, when given, sees each device after its page and rows (the demo's own outputs).
    /// </summary>
    public static async Task<(string FleetPage, int DevicePages)> WriteAsync(IRecordStore store, string folder, ReportContext context, ReportSelection selection,
        CancellationToken cancel, Action<DeviceReport>? alsoEach = null, Progress? progress = null)
    {
        progress?.Show("reading the fleet for the peer groups");
        using var writer = new ReportWriter(folder, context, selection.DevicePages);
        using var findingsCsvDone = new CompletedFile(Path.Combine(folder, "findings.csv"));
        using var findingsJsonDone = new CompletedFile(Path.Combine(folder, "findings.json"));
        using var verdictsCsvDone = new CompletedFile(Path.Combine(folder, "verdicts.csv"));
        using var verdictsJsonDone = new CompletedFile(Path.Combine(folder, "verdicts.json"));
        using var findingsJson = new FindingJson(findingsJsonDone.Writer);
        var files = new Files(writer, new FindingCsv(findingsCsvDone.Writer), findingsJson,
            VerdictFiles(verdictsCsvDone.Writer, verdictsJsonDone.Writer), alsoEach);
        await ReportPipeline.RunAsync(store, context.Policy, context.AsOf, selection, files, progress is null ? null : progress.Step, cancel).ConfigureAwait(false);

        findingsJson.Finish();
        files.Verdicts.Finish();
        foreach (var done in new[] { findingsCsvDone, findingsJsonDone, verdictsCsvDone, verdictsJsonDone })
        {
            done.Complete();
        }

        return (writer.Finish(selection.Describe), writer.DevicePages);
    }

    // Each device to its page and its rows in the four data files.
    // The verdicts as CSV and JSON, each test's row made once for both files.
    private static VerdictWriters VerdictFiles(TextWriter csv, TextWriter json)
    {
        var rows = new VerdictRows();
        return new VerdictWriters(new VerdictCsv(csv, rows), new VerdictJson(json, rows), new VerdictCounts());
    }

    private sealed class Files(ReportWriter pages, FindingCsv findingsCsv, FindingJson findingsJson, VerdictWriters verdicts, Action<DeviceReport>? alsoEach)
        : IDeviceReportSink
    {
        public VerdictWriters Verdicts => verdicts;

        public void Add(DeviceReport device)
        {
            pages.Add(device);
            findingsCsv.Add(device.Condition, device.Condition.Findings);
            findingsJson.Add(device.Condition, device.Condition.Findings);
            foreach (var trip in device.Trips)
            {
                verdicts.Add(trip);
            }

            alsoEach?.Invoke(device);
        }
    }
}
