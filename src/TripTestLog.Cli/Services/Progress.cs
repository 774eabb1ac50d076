namespace TripTestLog.Cli.Services;

/// <summary>
/// Progress for long work (files imported, devices reported) on the error stream: a redrawn line on a terminal, nothing
/// for a handful of steps or when output is redirected (a log reader wants the summary, not a line per step).
/// </summary>
internal sealed class Progress : IDisposable
{
    /// <summary>Below this many files an import is quick enough to need no progress line.</summary>
    private const int MinimumFiles = 4;

    private readonly TextWriter? _writer;
    private readonly int _total;
    private int _done;
    private string _phase = "";

    private Progress(TextWriter? writer, int total)
    {
        _writer = writer;
        _total = total;
    }

    public static Progress For(CliContext cli, int total) =>
        new(cli.ErrorIsTerminal && total >= MinimumFiles ? cli.Error : null, total);

    public void Step(string what)
    {
        _done++;
        Show(what);
    }

    /// <summary>Says what is being done now without counting a step, e.g. the pass that comes before the first one.</summary>
    public void Show(string what)
    {
        _phase = what;
        if (_writer is null)
        {
            return;
        }

        var width = 30;
        var filled = _total == 0 ? width : width * _done / _total;
        var text = $"[{new string('#', filled)}{new string('.', width - filled)}] {_done}/{_total} {_phase}";
        text = Output.Visible.Text(text);
        Output.Visible.Exact(_writer).Write('\r');
        _writer.Write(text.Length > 100 ? text[..100] : text.PadRight(100));
    }

    public void Dispose()
    {
        if (_writer is not null)
        {
            Output.Visible.Exact(_writer).Write("\r" + new string(' ', 100) + "\r");
            _writer.Flush();
        }
    }
}
