namespace CellCheck.IO.Data;

/// <summary>A read-only stream of some leading bytes (a header line) followed by a file from a byte offset to its end.</summary>
internal sealed class RangeStream : Stream
{
    private readonly byte[] _lead;
    private readonly FileStream _file;
    private int _leadRead;

    public RangeStream(string path, byte[] lead, long start)
    {
        _lead = lead;
        _file = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
        _file.Position = start;
    }

    public override bool CanRead => true;

    public override bool CanSeek => false;

    public override bool CanWrite => false;

    public override long Length => throw new NotSupportedException();

    public override long Position
    {
        get => throw new NotSupportedException();
        set => throw new NotSupportedException();
    }

    public override int Read(Span<byte> buffer)
    {
        if (_leadRead < _lead.Length)
        {
            var count = Math.Min(buffer.Length, _lead.Length - _leadRead);
            _lead.AsSpan(_leadRead, count).CopyTo(buffer);
            _leadRead += count;
            return count;
        }

        return _file.Read(buffer);
    }

    public override int Read(byte[] buffer, int offset, int count) => Read(buffer.AsSpan(offset, count));

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
            _file.Dispose();
        }

        base.Dispose(disposing);
    }
}
