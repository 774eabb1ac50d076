using System.Text;

namespace TripTestLog.Reports;

/// <summary>
/// A report file written under a temporary name beside its target (<c>NAME.partial</c>) and renamed to its own name
/// only when complete, so a run that stops part-way (a full disk, Ctrl+C, a failure) leaves the earlier complete file,
/// or none, never a truncated one. Disposed without <see cref="Complete"/>, the temporary file is removed.
/// </summary>
public sealed class CompletedFile : IDisposable
{
    private readonly string _path;
    private readonly string _partial;
    private StreamWriter? _writer;

    /// <summary>Starts <paramref name="path"/>: text goes to <see cref="Writer"/>, UTF-8 without a byte-order mark.</summary>
    public CompletedFile(string path)
    {
        _path = path;
        _partial = path + ".partial";
        _writer = new StreamWriter(_partial, append: false, new UTF8Encoding(false));
    }

    /// <summary>Where the file's text goes until it is complete.</summary>
    public StreamWriter Writer => _writer ?? throw new InvalidOperationException($"{_path} is already complete");

    /// <summary>Writes <paramref name="text"/> to <paramref name="path"/> whole, or leaves it as it was.</summary>
    public static void WriteAllText(string path, string text)
    {
        using var file = new CompletedFile(path);
        file.Writer.Write(text);
        file.Complete();
    }

    /// <summary>Flushes the text to disk and gives the file its name, replacing an earlier one; throws <see cref="IOException"/> when it cannot.</summary>
    public void Complete()
    {
        var writer = Writer;
        writer.Flush();
        ((FileStream)writer.BaseStream).Flush(flushToDisk: true);
        writer.Dispose();
        _writer = null;
        File.Move(_partial, _path, overwrite: true);
    }

    /// <summary>Removes the temporary file when the text never completed.</summary>
    public void Dispose()
    {
        if (_writer is null)
        {
            return;
        }

        try
        {
            _writer.Dispose();
        }
        catch (IOException)
        {
            // A full disk fails the last flush too; the partial file goes either way.
        }

        _writer = null;
        File.Delete(_partial);
    }
}
