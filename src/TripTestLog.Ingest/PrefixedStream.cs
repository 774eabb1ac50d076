namespace TripTestLog.Ingest;

/// <summary>Replays bytes already read from a stream (to look at the header) before the rest of it, so the file is read once.</summary>
internal sealed class PrefixedStream(byte[] prefix, int length, Stream rest) : Stream
{
    private int _position;

    public override bool CanRead => true;

    public override bool CanSeek => false;

    public override bool CanWrite => false;

    public override long Length => throw new NotSupportedException();

    public override long Position
    {
        get => throw new NotSupportedException();
        set => throw new NotSupportedException();
    }

    public override int Read(byte[] buffer, int offset, int count) => Read(buffer.AsSpan(offset, count));

    public override int Read(Span<byte> buffer)
    {
        if (_position < length)
        {
            var n = Math.Min(buffer.Length, length - _position);
            prefix.AsSpan(_position, n).CopyTo(buffer);
            _position += n;
            return n;
        }

        return rest.Read(buffer);
    }

    public override void Flush()
    {
    }

    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();

    public override void SetLength(long value) => throw new NotSupportedException();

    public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();

    // The rest belongs to the caller, who also needs it after this stream is done (to finish its hash).
    protected override void Dispose(bool disposing) => base.Dispose(disposing);
}
