using TripTestLog.Application.Stores;
using System.Reflection;
using System.Threading.Channels;
using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;
using TripTestLog.Cli.Output;
using TripTestLog.Domain.Devices;
using TripTestLog.Reports;

namespace TripTestLog.Cli.Services;

/// <summary>
/// One report run: the findings pipeline streams each device to the report writer (its page), and to the companion
/// files beside the pages (findings and verdicts as CSV and JSON), so nothing is held for the whole fleet.
/// </summary>
internal static class ReportRun
{
    /// <summary>What to include.</summary>
    public sealed record Selection(string? Site, AssetTag? Only, DateOnly? From, DateOnly? To, bool DevicePages)
    {
        public string Describe => (Site is null ? "" : $", site {Site}") + (Only is { } t ? $", device {t}" : "")
            + (From is { } f ? $", tests from {f:yyyy-MM-dd}" : "") + (To is { } to ? $", tests to {to:yyyy-MM-dd}" : "");
    }

    /// <summary>The tool's version, as every page prints it.</summary>
    public static string ToolVersion =>
        typeof(ReportRun).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "unknown";

    /// <summary>
    /// Writes the report into <paramref name="folder"/> and returns the fleet page's path and the number of device pages;
    /// <paramref name="alsoEach"/>, when given, sees each device on the writing thread too (the demo's own outputs).
    /// The findings pipeline runs on this thread and hands each device through a small bounded queue to a second thread
    /// that writes its page and its rows in the data files: judging and writing overlap on two cores, and at most 16
    /// devices wait in between.
    /// </summary>
    public static (string FleetPage, int DevicePages) Write(IRecordStore store, string folder, ReportContext context, Selection selection, CancellationToken cancel,
        Action<DeviceReport>? alsoEach = null, Progress? progress = null)
    {
        progress?.Show("reading the fleet for the peer groups");
        using var writer = new ReportWriter(folder, context, selection.DevicePages);
        using var findingsCsvDone = new CompletedFile(Path.Combine(folder, "findings.csv"));
        using var findingsJsonDone = new CompletedFile(Path.Combine(folder, "findings.json"));
        using var verdictsCsvDone = new CompletedFile(Path.Combine(folder, "verdicts.csv"));
        using var verdictsJsonDone = new CompletedFile(Path.Combine(folder, "verdicts.json"));
        var (findingsCsvFile, findingsJsonFile) = (findingsCsvDone.Writer, findingsJsonDone.Writer);
        var (verdictsCsvFile, verdictsJsonFile) = (verdictsCsvDone.Writer, verdictsJsonDone.Writer);
        var findingsCsv = new FindingCsv(findingsCsvFile);
        using var findingsJson = new FindingJson(findingsJsonFile);
        var verdicts = new VerdictWriters(new VerdictCsv(verdictsCsvFile), new VerdictJson(verdictsJsonFile), new VerdictCounts());
        var queue = Channel.CreateBounded<DeviceReport>(new BoundedChannelOptions(16) { SingleReader = true, SingleWriter = true });
        var writing = Task.Run(async () =>
        {
            try
            {
                await foreach (var device in queue.Reader.ReadAllAsync(CancellationToken.None))
                {
                    writer.Add(device);
                    findingsCsv.Add(device.Condition, device.Condition.Findings);
                    findingsJson.Add(device.Condition, device.Condition.Findings);
                    foreach (var trip in device.Trips)
                    {
                        verdicts.Add(trip);
                    }

                    alsoEach?.Invoke(device);
                }
            }
            catch (Exception e)
            {
                // Closing the queue with the failure releases the reading thread, which then rethrows it.
                queue.Writer.TryComplete(e);
                throw;
            }
        }, CancellationToken.None);
        Exception? failure = null;
        try
        {
            foreach (var device in FindingsPipeline.RunWithRecords(store, context.Policy, context.AsOf, selection.Only, cancel))
            {
                progress?.Step(device.Condition.Device.Tag.Value);
                if (selection.Site is { } site && !string.Equals(device.Condition.Device.Site, site, StringComparison.OrdinalIgnoreCase))
                {
                    continue;
                }

                var shown = selection.From is null && selection.To is null ? device : device with { Trips = [.. device.Trips.Where(t => InPeriod(t, selection))] };
                while (!queue.Writer.TryWrite(shown))
                {
                    bool open;
                    try
                    {
                        open = queue.Writer.WaitToWriteAsync(CancellationToken.None).AsTask().GetAwaiter().GetResult();
                    }
                    catch (Exception) when (writing.IsFaulted || writing.IsCompleted)
                    {
                        open = false;
                    }

                    if (!open)
                    {
                        writing.GetAwaiter().GetResult();
                        throw new InvalidOperationException("the report writer stopped early");
                    }
                }
            }
        }
        catch (Exception e)
        {
            failure = e;
        }

        // The writing thread finishes what it holds before the files close, whichever side failed.
        queue.Writer.TryComplete();
        try
        {
            writing.GetAwaiter().GetResult();
        }
        catch (Exception) when (failure is not null)
        {
            // The reading side's failure is the one to report.
        }

        if (failure is not null)
        {
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Throw(failure);
        }

        findingsJson.Finish();
        verdicts.Finish();
        foreach (var done in new[] { findingsCsvDone, findingsJsonDone, verdictsCsvDone, verdictsJsonDone })
        {
            done.Complete();
        }

        return (writer.Finish(selection.Describe), writer.DevicePages);
    }

    private static bool InPeriod(JudgedTrip trip, Selection selection)
    {
        var date = trip.Trip.Measurement.TestedAt.Date;
        return (selection.From is not { } from || date >= from) && (selection.To is not { } to || date <= to);
    }
}
