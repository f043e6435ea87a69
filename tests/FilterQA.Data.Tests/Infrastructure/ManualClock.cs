namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>A clock that moves only when a test moves it, so every stored time is known in advance.</summary>
public sealed class ManualClock(DateTimeOffset start) : TimeProvider
{
    private long _ticks = start.UtcTicks;

    public override DateTimeOffset GetUtcNow() => new(Interlocked.Read(ref _ticks), TimeSpan.Zero);

    public void Advance(TimeSpan step) => Interlocked.Add(ref _ticks, step.Ticks);
}
