namespace TripTestLog.Cli.Tests;

/// <summary>Runs the command line in-process with captured output and a fixed clock.</summary>
internal static class CliRun
{
    public static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    public static (int Exit, string Out, string Error) Run(params string[] args) => RunAt(Now, args);

    /// <summary>Runs with the clock at <paramref name="now"/>, as on a machine whose clock is set differently.</summary>
    public static (int Exit, string Out, string Error) RunAt(DateTimeOffset now, params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var exit = CliApp.RunAsync(args, new CliContext(output, error, new FixedClock(now), false)).GetAwaiter().GetResult();
        return (exit, output.ToString(), error.ToString());
    }

    /// <summary>Runs as from a terminal: the error stream is one, so progress lines are drawn on it.</summary>
    public static (int Exit, string Out, string Error) RunOnTerminal(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var exit = CliApp.RunAsync(args, new CliContext(output, error, new FixedClock(Now), true)).GetAwaiter().GetResult();
        return (exit, output.ToString(), error.ToString());
    }

    /// <summary>Error text with its wrapped lines joined again, so a sentence can be compared whole.</summary>
    public static string Unwrapped(string text) => text.Trim().ReplaceLineEndings("\n").Replace("\n  ", " ", StringComparison.Ordinal);

    private sealed class FixedClock(DateTimeOffset now) : TimeProvider
    {
        public override DateTimeOffset GetUtcNow() => now;

        public override TimeZoneInfo LocalTimeZone => TimeZoneInfo.Utc;
    }
}
