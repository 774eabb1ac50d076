using System.Runtime.ExceptionServices;
using System.Threading.Channels;
using TripTestLog.Application.Check;
using TripTestLog.Application.Findings;

namespace TripTestLog.Application.Reports;

/// <summary>
/// One report run: the findings pipeline judges the fleet device by device and hands each selected device (its trips
/// cut to the selected period) to a sink, nothing held for the whole fleet. Judging and writing overlap: the sink is fed
/// from a second task through a small bounded queue, so at most 16 devices wait in between.
/// </summary>
public static class ReportPipeline
{
    private const int Waiting = 16;

    /// <summary>
    /// Judges <paramref name="source"/>'s fleet and gives each device that <paramref name="selection"/> keeps to
    /// <paramref name="sink"/>; <paramref name="step"/> is told each device's tag as it is judged (selected or not).
    /// </summary>
    /// <exception cref="OperationCanceledException">When <paramref name="cancel"/> stops the run.</exception>
    /// <remarks>A failure on either side stops both; the sink has then taken what was handed over before it, and the reading side's failure is the one thrown.</remarks>
    public static async Task RunAsync(ITripSource source, FindingPolicy policy, DateOnly asOf, ReportSelection selection, IDeviceReportSink sink,
        Action<string>? step, CancellationToken cancel)
    {
        ArgumentNullException.ThrowIfNull(selection);
        ArgumentNullException.ThrowIfNull(sink);
        var queue = Channel.CreateBounded<DeviceReport>(new BoundedChannelOptions(Waiting) { SingleReader = true, SingleWriter = true });
        var writing = Task.Run(async () =>
        {
            try
            {
                await foreach (var device in queue.Reader.ReadAllAsync(CancellationToken.None).ConfigureAwait(false))
                {
                    sink.Add(device);
                }
            }
            catch (Exception e)
            {
                // Closing the queue with the failure releases the reading side, which then reports it.
                queue.Writer.TryComplete(e);
                throw;
            }
        }, CancellationToken.None);

        Exception? failure = null;
        try
        {
            foreach (var device in FindingsPipeline.RunWithRecords(source, policy, asOf, selection.Only, cancel))
            {
                step?.Invoke(device.Condition.Device.Tag.Value);
                if (selection.Site is { } site && !string.Equals(device.Condition.Device.Site, site, StringComparison.OrdinalIgnoreCase))
                {
                    continue;
                }

                var shown = selection.From is null && selection.To is null ? device : device with { Trips = [.. device.Trips.Where(t => InPeriod(t, selection))] };
                await queue.Writer.WriteAsync(shown, CancellationToken.None).ConfigureAwait(false);
            }
        }
        catch (ChannelClosedException)
        {
            // The writing side failed and closed the queue: its failure is the one to report, below.
        }
        catch (Exception e)
        {
            failure = e;
        }

        // The writing side finishes what it holds, whichever side failed.
        queue.Writer.TryComplete();
        try
        {
            await writing.ConfigureAwait(false);
        }
        catch (Exception) when (failure is not null)
        {
            // The reading side's failure is the one to report.
        }

        if (failure is not null)
        {
            ExceptionDispatchInfo.Throw(failure);
        }
    }

    private static bool InPeriod(JudgedTrip trip, ReportSelection selection)
    {
        var date = trip.Trip.Measurement.TestedAt.Date;
        return (selection.From is not { } from || date >= from) && (selection.To is not { } to || date <= to);
    }
}
