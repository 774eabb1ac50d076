using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;

namespace TripTestLog.Cli.Output;

/// <summary>
/// The one way this tool writes JSON: a <see cref="Utf8JsonWriter"/> whose bytes stream straight into the output as
/// they are flushed (nothing collects a whole document), with one encoder for every file and stream, so a character is
/// spelt the same everywhere: <c>°C</c>, <c>µΩ</c> and other text as themselves, control characters, quotes and
/// backslashes escaped as JSON requires.
/// </summary>
/// <remarks>
/// The encoder does not escape <c>&lt;</c>, <c>&gt;</c>, <c>&amp;</c> or <c>'</c>: the JSON goes to files and stdout,
/// never inside an HTML page. JSON that is ever put into a page's script must be written with
/// <see cref="JavaScriptEncoder.Default"/> (or <c>JavaScriptEncoder.Create(UnicodeRanges.All)</c>) instead.
/// </remarks>
internal sealed class JsonOutput : IDisposable
{
    /// <summary>The encoder every JSON output uses.</summary>
    public static readonly JavaScriptEncoder Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping;

    private readonly TextWriter _writer;
    private readonly TextSink _sink;

    /// <summary>Writes into <paramref name="writer"/>, which must be an exact writer (<see cref="Visible.Exact"/>), indented or one value per line.</summary>
    public JsonOutput(TextWriter writer, bool indented = true)
    {
        _writer = writer;
        _sink = new TextSink(writer);
        Json = new Utf8JsonWriter(_sink, new JsonWriterOptions { Indented = indented, Encoder = Encoder });
    }

    /// <summary>The writer to write values with.</summary>
    public Utf8JsonWriter Json { get; }

    /// <summary>Hands what is written so far to the output (call it once per device or row: memory holds one at a time).</summary>
    public void Flush() => Json.Flush();

    /// <summary>
    /// Writes <paramref name="text"/> (layout between whole values, such as a line break) after what is written so far;
    /// a finished top-level value is closed, so the next one may start.
    /// </summary>
    public void Raw(string text)
    {
        Json.Flush();
        if (Json.CurrentDepth == 0)
        {
            Json.Reset();
        }

        _writer.Write(text);
    }

    /// <summary>Flushes what is left; the output itself stays open.</summary>
    public void Dispose()
    {
        Json.Dispose();
        _sink.Dispose();
    }

    // UTF-8 bytes decoded into a text writer as they come; a character split between two writes is kept until whole.
    private sealed class TextSink(TextWriter writer) : Stream
    {
        private readonly Decoder _decoder = new UTF8Encoding(false, true).GetDecoder();
        private char[] _chars = new char[1024];

        public override bool CanRead => false;

        public override bool CanSeek => false;

        public override bool CanWrite => true;

        public override long Length => throw new NotSupportedException();

        public override long Position
        {
            get => throw new NotSupportedException();
            set => throw new NotSupportedException();
        }

        public override void Write(ReadOnlySpan<byte> buffer)
        {
            var needed = _decoder.GetCharCount(buffer, flush: false);
            if (needed > _chars.Length)
            {
                _chars = new char[Math.Max(needed, _chars.Length * 2)];
            }

            var count = _decoder.GetChars(buffer, _chars, flush: false);
            writer.Write(_chars, 0, count);
        }

        public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));

        public override void Flush()
        {
        }

        public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();

        public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();

        public override void SetLength(long value) => throw new NotSupportedException();
    }
}
