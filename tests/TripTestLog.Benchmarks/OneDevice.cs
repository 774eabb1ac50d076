using System.Diagnostics;
using System.Globalization;

namespace TripTestLog.Benchmarks;

/// <summary>
/// The one-device answers a technician runs at the bench, each as its own process the way a shell starts it, timed by
/// wall clock: the median of N runs of each command against the median of N runs of a bare --version in the same run.
/// The runs are interleaved command by command, so a shared machine's drift touches every command alike. With an earlier
/// build's executable (--before), each of its runs is interleaved with this build's, so the two compare in one run.
/// </summary>
internal static class OneDevice
{
    public static int Run(string database, string asset, int runs, string? before = null, string? tool = null)
    {
        if (tool is not null && !File.Exists(tool))
        {
            throw new ArgumentException($"--tool: no executable at {tool}");
        }

        if (before is not null && !File.Exists(before))
        {
            throw new ArgumentException($"--before: no executable at {before}");
        }

        if (!File.Exists(database))
        {
            throw new ArgumentException($"--one-device: no database at {database}");
        }

        tool ??= Path.Combine(AppContext.BaseDirectory, OperatingSystem.IsWindows() ? "triptestlog.exe" : "triptestlog");
        string[][] commands =
        [
            ["--version"],
            ["check", "--asset", asset, "--db", database],
            ["findings", "--asset", asset, "--db", database],
            ["history", "--asset", asset, "--db", database],
            ["envelope", "--asset", asset, "--db", database],
            ["devices", "--db", database],
            ["instruments", "--db", database],
        ];
        var times = commands.Select(_ => new List<double>()).ToArray();
        var earlier = commands.Select(_ => new List<double>()).ToArray();
        Time(tool, commands[0]); // the first start pays for loading the runtime from disk
        if (before is not null)
        {
            Time(before, commands[0]);
        }

        for (var i = 0; i < runs; i++)
        {
            for (var c = 0; c < commands.Length; c++)
            {
                times[c].Add(Time(tool, commands[c]));
                if (before is not null)
                {
                    earlier[c].Add(Time(before, commands[c]));
                }
            }
        }

        Console.WriteLine($"TripTestLog one-device answers, {asset} in {database}, median of {runs} runs, {Environment.ProcessorCount} cores, {DateTime.UtcNow:yyyy-MM-dd}");
        Console.WriteLine($"now: {tool}" + (before is null ? "" : $"; before: {before}"));
        Console.WriteLine(before is null ? "command                 median s  x --version" : "command                 median s  x --version   before s  x --version  before / now");
        var baseline = Median(times[0]);
        var earlierBaseline = before is null ? 0 : Median(earlier[0]);
        for (var c = 0; c < commands.Length; c++)
        {
            var name = commands[c].Length > 1 && commands[c][1] == "--asset" ? $"{commands[c][0]} --asset" : commands[c][0];
            var median = Median(times[c]);
            var line = string.Create(CultureInfo.InvariantCulture, $"{name,-22}  {median,8:0.000}  {median / baseline,11:0.00}");
            if (before is not null)
            {
                var then = Median(earlier[c]);
                line += string.Create(CultureInfo.InvariantCulture, $"  {then,9:0.000}  {then / earlierBaseline,11:0.00}  {then / median,12:0.00}");
            }

            Console.WriteLine(line);
        }

        return 0;
    }

    private static double Time(string tool, string[] args)
    {
        var info = new ProcessStartInfo(tool) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        var clock = Stopwatch.StartNew();
        using var process = Process.Start(info)!;
        process.StandardOutput.ReadToEnd();
        process.StandardError.ReadToEnd();
        process.WaitForExit();
        clock.Stop();
        if (process.ExitCode is not 0 and not 1)
        {
            throw new InvalidOperationException($"triptestlog {string.Join(' ', args)} failed with exit code {process.ExitCode}");
        }

        return clock.Elapsed.TotalSeconds;
    }

    private static double Median(List<double> values)
    {
        var sorted = values.Order().ToList();
        return sorted.Count % 2 == 1 ? sorted[sorted.Count / 2] : (sorted[sorted.Count / 2 - 1] + sorted[sorted.Count / 2]) / 2;
    }
}
