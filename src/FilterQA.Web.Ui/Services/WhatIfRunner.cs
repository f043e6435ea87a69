using FilterQA.Core.Formats;
using FilterQA.Data;
using FilterQA.Data.Services;

namespace FilterQA.Web.Ui.Services;

/// <summary>
/// Owns one what-if run per circuit (scoped): starts it as a background task off the render thread, keeps the latest
/// progress, and tells the page through <see cref="Changed"/> (the page calls InvokeAsync(StateHasChanged)). The run
/// reads through its own database contexts (the factory), never the page's. A cancelled run leaves no report.
/// </summary>
public sealed class WhatIfRunner(IWhatIfEngine engine, TimeProvider clock) : IDisposable
{
    /// <summary>The least time between two progress notices; the last one of a run always goes through.</summary>
    public static readonly TimeSpan MinimumNoticeGap = TimeSpan.FromMilliseconds(150);

    private readonly Lock _gate = new();
    private WhatIfRunSnapshot _current = WhatIfRunSnapshot.Idle;
    private CancellationTokenSource? _stop;
    private Task _task = Task.CompletedTask;
    private long _generation;
    private long _lastNoticeTicks;

    /// <summary>Raised (on a background thread) when the run moves on, finishes, is cancelled or fails.</summary>
    public event Action? Changed;

    /// <summary>The run as it stands.</summary>
    public WhatIfRunSnapshot Current => Volatile.Read(ref _current);

    /// <summary>The background task of the latest run (completed when none); for tests and orderly shutdown.</summary>
    public Task Completion => _task;

    /// <summary>Starts a run of <paramref name="revision"/> of <paramref name="partNumber"/>; false (and nothing started) while one is running.</summary>
    public bool Start(string partNumber, int revision)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(partNumber);
        lock (_gate)
        {
            if (_current.State == WhatIfRunState.Running)
            {
                return false;
            }
            _stop?.Dispose();
            _stop = new CancellationTokenSource();
            long generation = ++_generation;
            _current = new WhatIfRunSnapshot(WhatIfRunState.Running, partNumber, revision, null, null, null);
            CancellationToken token = _stop.Token;
            _task = Task.Run(() => RunAsync(generation, partNumber, revision, token), CancellationToken.None);
        }
        Notify();
        return true;
    }

    /// <summary>Asks the running run to stop; it then reports <see cref="WhatIfRunState.Cancelled"/>.</summary>
    public void Cancel()
    {
        lock (_gate)
        {
            if (_current.State == WhatIfRunState.Running)
            {
                _stop?.Cancel();
            }
        }
    }

    /// <summary>Cancels a running run (the circuit is closing).</summary>
    public void Dispose()
    {
        Changed = null;
        lock (_gate)
        {
            _stop?.Cancel();
        }
    }

    private async Task RunAsync(long generation, string partNumber, int revision, CancellationToken token)
    {
        WhatIfRunSnapshot end;
        try
        {
            WhatIfReport report = await engine.RunAsync(partNumber, revision, new ProgressSink(this, generation), token).ConfigureAwait(false);
            // A run that finished just as Cancel was pressed still counts as cancelled: the person asked for nothing.
            end = token.IsCancellationRequested
                ? new WhatIfRunSnapshot(WhatIfRunState.Cancelled, partNumber, revision, Current.Progress, null, null)
                : new WhatIfRunSnapshot(WhatIfRunState.Finished, partNumber, revision,
                    new WhatIfProgress(report.MeasurementsEvaluated, report.MeasurementsEvaluated), report, null);
        }
        catch (OperationCanceledException) when (token.IsCancellationRequested)
        {
            end = new WhatIfRunSnapshot(WhatIfRunState.Cancelled, partNumber, revision, Current.Progress, null, null);
        }
        catch (Exception e) when (e is RecordNotFoundException or ArgumentException or InvalidDataException or StorageRuleException or SweepReadException)
        {
            end = new WhatIfRunSnapshot(WhatIfRunState.Failed, partNumber, revision, Current.Progress, null, Words.Sentence(e.Message));
        }
        lock (_gate)
        {
            if (generation != _generation)
            {
                return;
            }
            _current = end;
        }
        Notify();
    }

    private void OnProgress(long generation, WhatIfProgress progress)
    {
        lock (_gate)
        {
            if (generation != _generation || _current.State != WhatIfRunState.Running)
            {
                return;
            }
            _current = _current with { Progress = progress };
        }
        long now = clock.GetTimestamp();
        long last = Interlocked.Read(ref _lastNoticeTicks);
        if (clock.GetElapsedTime(last, now) >= MinimumNoticeGap && Interlocked.CompareExchange(ref _lastNoticeTicks, now, last) == last)
        {
            Notify();
        }
    }

    private void Notify() => Changed?.Invoke();

    // Progress<T> would post to a captured context; the run has none, so the sink records the value directly.
    private sealed class ProgressSink(WhatIfRunner runner, long generation) : IProgress<WhatIfProgress>
    {
        public void Report(WhatIfProgress value) => runner.OnProgress(generation, value);
    }
}
