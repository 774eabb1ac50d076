namespace TripTestLog.Cli;

/// <summary>What a command may touch outside itself: the output streams and the clock, injected so tests can capture them.</summary>
/// <param name="Out">Where results go (tables, JSON, CSV).</param>
/// <param name="Error">Where progress and problems go.</param>
/// <param name="Clock">Today's date and the import time come from here.</param>
/// <param name="ErrorIsTerminal">Whether a live progress bar can be drawn on <paramref name="Error"/>.</param>
internal sealed record CliContext(TextWriter Out, TextWriter Error, TimeProvider Clock, bool ErrorIsTerminal)
{
    /// <summary>Today in local time: record dates after it are refused.</summary>
    public DateOnly Today => DateOnly.FromDateTime(Clock.GetLocalNow().DateTime);

    /// <summary>Cancelled by Ctrl+C (in the real program): long pipelines stop and roll back the file in progress.</summary>
    public CancellationToken Cancel { get; init; }
}
