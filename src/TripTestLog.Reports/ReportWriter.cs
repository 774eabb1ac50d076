using System.Collections.Concurrent;
using System.Runtime.ExceptionServices;
using TripTestLog.Application.Findings;
using TripTestLog.Reports.Html;

namespace TripTestLog.Reports;

/// <summary>
/// Writes a report folder as device conditions stream past: one self-contained page per device in <c>devices/</c>
/// (inline styles and SVG charts, no network fetch), and the fleet page <c>index.html</c> at the end from the bounded
/// fleet lists. Device pages are independent files, so they are drawn on every core: the caller's thread takes each
/// device into the fleet lists in order and hands its page to a few page writers through a short bounded queue, so
/// memory stays flat however large the fleet.
/// </summary>
public sealed class ReportWriter : IDisposable
{
    private readonly string _folder;
    private readonly ReportContext _context;
    private readonly bool _devicePages;
    private readonly FleetReport _fleet;
    private readonly BlockingCollection<DeviceReport>? _waiting;
    private readonly Task[] _pageWriters;
    private ExceptionDispatchInfo? _failure;
    private int _pages;
    private bool _disposed;

    /// <summary>Starts a report in <paramref name="folder"/> (created if missing); <paramref name="devicePages"/> writes a page per device.</summary>
    public ReportWriter(string folder, ReportContext context, bool devicePages)
    {
        _folder = folder;
        _context = context;
        _devicePages = devicePages;
        _fleet = new FleetReport(30) { Models = new FleetModels(context.Policy, context.Instruments, context.AsOf) };
        Directory.CreateDirectory(Path.Combine(folder, "devices"));
        // Two page writers a core: each page is made durable (fsync, then a rename) before the next, and while one
        // writer waits on the disk the other keeps its core drawing. At one a core, a 10,000-page report spent about a
        // quarter of each writer's time waiting.
        var writers = devicePages ? 2 * Math.Max(1, Environment.ProcessorCount) : 0;
        _waiting = devicePages ? new BlockingCollection<DeviceReport>(2 * writers) : null;
        _pageWriters = [.. Enumerable.Range(0, writers).Select(_ => Task.Factory.StartNew(WritePages, CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default))];
    }

    /// <summary>How many device pages were written (all of them once <see cref="Finish"/> has returned).</summary>
    public int DevicePages => Volatile.Read(ref _pages);

    /// <summary>Takes one device: its place in the fleet lists, and its page to a page writer.</summary>
    /// <exception cref="IOException">When a page could not be written (the first such failure).</exception>
    public void Add(DeviceReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        _failure?.Throw();
        _fleet.Add(report);
        try
        {
            _waiting?.Add(report);
        }
        catch (InvalidOperationException) when (_failure is not null)
        {
            // A page writer failed and closed the queue.
            _failure.Throw();
        }
    }

    /// <summary>
    /// Waits for every device page, then writes the fleet page and returns its path; <paramref name="selection"/>
    /// describes a filter, e.g. ", site X".
    /// </summary>
    public string Finish(string selection = "")
    {
        StopPageWriters();
        _failure?.Throw();
        var path = Path.Combine(_folder, "index.html");
        // Every device on the fleet page went through Add, so it has a page exactly when device pages are written.
        CompletedFile.WriteAllText(path, FleetPage.Write(_fleet, _context, tag => _devicePages ? Markup.PageName(tag) : null, selection));
        return path;
    }

    /// <summary>Stops the page writers (after the pages already handed over) when the report ends early.</summary>
    public void Dispose()
    {
        if (_disposed)
        {
            return;
        }

        _disposed = true;
        StopPageWriters();
        _waiting?.Dispose();
    }

    private void StopPageWriters()
    {
        if (_waiting is { IsAddingCompleted: false })
        {
            _waiting.CompleteAdding();
        }

        Task.WaitAll(_pageWriters);
    }

    private void WritePages()
    {
        try
        {
            foreach (var report in _waiting!.GetConsumingEnumerable())
            {
                var page = Markup.PageName(report.Condition.Device.Tag.Value);
                CompletedFile.WriteAllText(Path.Combine(_folder, "devices", page), DevicePage.Write(report, _context));
                Interlocked.Increment(ref _pages);
            }
        }
        catch (Exception e)
        {
            // The first failure is kept for the caller; closing the queue releases it if it waits to add.
            Interlocked.CompareExchange(ref _failure, ExceptionDispatchInfo.Capture(e), null);
            _waiting!.CompleteAdding();
        }
    }
}
