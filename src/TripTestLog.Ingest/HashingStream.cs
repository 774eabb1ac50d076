using System.Security.Cryptography;

namespace TripTestLog.Ingest;

/// <summary>A read-only stream that hashes every byte read through it, so a file is hashed in the same pass that parses it.</summary>
internal sealed class HashingStream(Stream inner) : Stream
{
    private readonly IncrementalHash _hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);

    public override bool CanRead => true;

    public override bool CanSeek => false;

    public override bool CanWrite => false;

    public override long Length => inner.Length;

    public override long Position
    {
        get => inner.Position;
        set => throw new NotSupportedException();
    }

    public override int Read(byte[] buffer, int offset, int count) => Read(buffer.AsSpan(offset, count));

    public override int Read(Span<byte> buffer)
    {
        var read = inner.Read(buffer);
        _hash.AppendData(buffer[..read]);
        return read;
    }

    /// <summary>Reads whatever is left (a reader may stop early) and returns the SHA-256 of the whole file, lower-case hex.</summary>
    public string Finish()
    {
        var rest = new byte[81920];
        while (Read(rest) > 0)
        {
        }

        return Convert.ToHexStringLower(_hash.GetHashAndReset());
    }

    public override void Flush()
    {
    }

    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();

    public override void SetLength(long value) => throw new NotSupportedException();

    public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();

    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            _hash.Dispose();
            inner.Dispose();
        }

        base.Dispose(disposing);
    }
}
