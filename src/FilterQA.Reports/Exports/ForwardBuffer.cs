namespace FilterQA.Reports.Exports;

/// <summary>
/// A forward-only stream that keeps what is written until <see cref="DrainAsync"/> passes it on. The zip writer
/// writes (and closes entries) synchronously, which a server response refuses; it writes here instead, and the
/// archive drains after each entry, so no more than one compressed entry is ever held in memory.
/// </summary>
internal sealed class ForwardBuffer : Stream
{
    private readonly MemoryStream _pending = new();

    public override bool CanRead => false;

    public override bool CanSeek => false;

    public override bool CanWrite => true;

    public override long Length => throw new NotSupportedException("a forward-only stream has no length");

    public override long Position
    {
        get => throw new NotSupportedException("a forward-only stream has no position");
        set => throw new NotSupportedException("a forward-only stream cannot seek");
    }

    /// <summary>Writes what is pending to <paramref name="target"/> and forgets it.</summary>
    public async Task DrainAsync(Stream target, CancellationToken cancellationToken)
    {
        if (_pending.Length == 0)
        {
            return;
        }
        await target.WriteAsync(_pending.GetBuffer().AsMemory(0, (int)_pending.Length), cancellationToken).ConfigureAwait(false);
        _pending.SetLength(0);
    }

    public override void Write(byte[] buffer, int offset, int count) => _pending.Write(buffer, offset, count);

    public override void Write(ReadOnlySpan<byte> buffer) => _pending.Write(buffer);

    public override void Flush()
    {
        // Nothing to do: draining is explicit and asynchronous.
    }

    public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException("a forward-only stream cannot be read");

    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException("a forward-only stream cannot seek");

    public override void SetLength(long value) => throw new NotSupportedException("a forward-only stream cannot seek");

    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            _pending.Dispose();
        }
        base.Dispose(disposing);
    }
}
