namespace TripTestLog.Cli.Tests;

/// <summary>Runs the command line in-process with captured output and a fixed clock.</summary>
internal static class CliRun
{
    public static readonly DateTimeOffset Now = new(2026, 12, 1, 9, 0, 0, TimeSpan.Zero);

    public static (int Exit, string Out, string Error) Run(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var exit = CliApp.Run(args, new CliContext(output, error, new FixedClock(Now), false));
        return (exit, output.ToString(), error.ToString());
    }

    private sealed class FixedClock(DateTimeOffset now) : TimeProvider
    {
        public override DateTimeOffset GetUtcNow() => now;

        public override TimeZoneInfo LocalTimeZone => TimeZoneInfo.Utc;
    }
}
