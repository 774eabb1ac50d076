using System.Diagnostics;
using System.Text;

namespace TripTestLog.Cli.Tests.Opening;

/// <summary>
/// The real program in a process of its own, its stdout and stderr captured as they come; optionally as another Unix
/// user (through runuser, so the operating system, not the program, decides what that user may touch).
/// </summary>
internal sealed class Child : IDisposable
{
    private readonly Process _process;
    private readonly StringBuilder _out = new();
    private readonly StringBuilder _error = new();

    private Child(Process process)
    {
        _process = process;
        process.OutputDataReceived += (_, e) => { lock (_out) { _out.AppendLine(e.Data); } };
        process.ErrorDataReceived += (_, e) => { lock (_error) { _error.AppendLine(e.Data); } };
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
    }

    public string Out { get { lock (_out) { return _out.ToString(); } } }

    public string Error { get { lock (_error) { return _error.ToString(); } } }

    public bool HasExited => _process.HasExited;

    public static Child StartWith(IReadOnlyDictionary<string, string>? environment, string? asUser, params string[] args) =>
        StartIn(null, environment, asUser, args);

    /// <summary>Starts it in <paramref name="folder"/> (where a server's lab policy is looked for), or in this process's folder.</summary>
    public static Child StartIn(string? folder, IReadOnlyDictionary<string, string>? environment, string? asUser, params string[] args)
    {
        var program = Path.Combine(AppContext.BaseDirectory, "triptestlog.dll");
        var info = new ProcessStartInfo(asUser is null ? "dotnet" : "runuser")
        {
            RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
            WorkingDirectory = folder ?? Directory.GetCurrentDirectory(),
        };
        if (asUser is not null)
        {
            foreach (var a in new[] { "-u", asUser, "--", "env", "HOME=/tmp", "DOTNET_CLI_TELEMETRY_OPTOUT=1", "dotnet" })
            {
                info.ArgumentList.Add(a);
            }
        }

        info.ArgumentList.Add(program);
        foreach (var arg in args)
        {
            info.ArgumentList.Add(arg);
        }

        foreach (var (key, value) in environment ?? new Dictionary<string, string>())
        {
            info.Environment[key] = value;
        }

        return new Child(Process.Start(info)!);
    }

    public static Child Start(params string[] args) => StartWith(null, null, args);

    /// <summary>Waits for the exit, at most <paramref name="limit"/> (then kills it and fails).</summary>
    public int Exit(TimeSpan limit)
    {
        if (!_process.WaitForExit(limit))
        {
            _process.Kill(entireProcessTree: true);
            throw new TimeoutException($"the command did not finish within {limit.TotalSeconds} s; stderr so far: {Error}");
        }

        _process.WaitForExit();
        return _process.ExitCode;
    }

    /// <summary>Kills it at once, as a power cut or `kill -9` would, and waits until it is gone.</summary>
    public void Kill()
    {
        _process.Kill(entireProcessTree: true);
        _process.WaitForExit();
    }

    /// <summary>True once <paramref name="condition"/> holds, false when <paramref name="limit"/> passes first.</summary>
    public static bool WaitFor(Func<bool> condition, TimeSpan limit)
    {
        var watch = Stopwatch.StartNew();
        while (!condition())
        {
            if (watch.Elapsed > limit)
            {
                return false;
            }

            Thread.Sleep(20);
        }

        return true;
    }

    public void Dispose()
    {
        if (!_process.HasExited)
        {
            _process.Kill(entireProcessTree: true);
            _process.WaitForExit();
        }

        _process.Dispose();
    }
}
