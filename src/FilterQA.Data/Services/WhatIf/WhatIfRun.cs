using System.Collections.Concurrent;
using FilterQA.Core.Decisions;
using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Core.Templates;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;

namespace FilterQA.Data.Services;

/// <summary>The state of one what-if run shared by its workers: counters per lot, the flips found, the progress.</summary>
internal sealed class WhatIfRun
{
    private readonly LimitTemplate _draft;
    private readonly WhatIfScope _scope;
    private readonly bool _originalForAll;
    private readonly IProgress<WhatIfProgress>? _progress;
    private readonly int _interval;
    private readonly WhatIfService _service;
    private readonly Dictionary<long, int> _lotIndex;
    private readonly int[] _recordedGo, _whatIfGo, _recordedFirstGo, _whatIfFirstGo;
    private readonly ConcurrentBag<(WhatIfRow Row, UnitEvaluation Evaluation)> _flips = [];
    private readonly ConcurrentDictionary<long, Lazy<Task<Sweep>>> _thrus = new();
    private int _evaluated;
    private int _fromOriginal;

    internal WhatIfRun(LimitTemplate draft, WhatIfScope scope, bool originalForAll, IProgress<WhatIfProgress>? progress, int interval, WhatIfService service)
    {
        _draft = draft;
        _scope = scope;
        _originalForAll = originalForAll;
        _progress = progress;
        _interval = interval;
        _service = service;
        _lotIndex = scope.Lots.Select((lot, i) => (lot.Id, i)).ToDictionary(p => p.Id, p => p.i);
        _recordedGo = new int[scope.Lots.Count];
        _whatIfGo = new int[scope.Lots.Count];
        _recordedFirstGo = new int[scope.Lots.Count];
        _whatIfFirstGo = new int[scope.Lots.Count];
    }

    internal int Evaluated => Volatile.Read(ref _evaluated);

    internal int FromOriginalFiles => Volatile.Read(ref _fromOriginal);

    internal async ValueTask JudgeAsync(WhatIfRow row, CancellationToken cancellationToken)
    {
        TimeSpan? thruAge = null;
        if (row.ThruReferenceId is { } thruId)
        {
            thruAge = _scope.ThruMeasuredAt.TryGetValue(thruId, out DateTimeOffset thruAt)
                ? row.MeasuredAt - thruAt
                : throw new InvalidDataException(FormattableString.Invariant($"measurement {row.Id}: its thru reference {thruId} is not stored"));
        }
        MeasurementInput input;
        try
        {
            input = _originalForAll || row.Path != ResponsePath.Transmission
                ? await FromOriginalAsync(row, thruAge, cancellationToken).ConfigureAwait(false)
                : EvaluationInputs.FromCompactTrace(ResponseTraceCodec.Decode(row.Trace), thruAge, row.FileName);
        }
        catch (Exception e) when (e is InvalidDataException or SweepReadException or ArgumentException)
        {
            throw new InvalidDataException(FormattableString.Invariant($"measurement {row.Id} (lot unit {row.Serial}) cannot be judged again: {e.Message}"), e);
        }
        UnitEvaluation evaluation = TemplateEvaluator.Evaluate(_draft, input);

        int lot = _lotIndex[row.LotId];
        bool recordedGo = row.Verdict == UnitVerdict.Go, whatIfGo = evaluation.Verdict == UnitVerdict.Go;
        if (row.IsCounted)
        {
            Interlocked.Add(ref _recordedGo[lot], recordedGo ? 1 : 0);
            Interlocked.Add(ref _whatIfGo[lot], whatIfGo ? 1 : 0);
        }
        if (row.Attempt == 1)
        {
            Interlocked.Add(ref _recordedFirstGo[lot], recordedGo ? 1 : 0);
            Interlocked.Add(ref _whatIfFirstGo[lot], whatIfGo ? 1 : 0);
        }
        if (evaluation.Verdict != row.Verdict)
        {
            _flips.Add((row with { Trace = [], RawCompressed = null }, evaluation));
        }
        int done = Interlocked.Increment(ref _evaluated);
        if (_progress is not null && done % _interval == 0)
        {
            _progress.Report(new WhatIfProgress(done, Math.Max(done, _scope.Total)));
        }
    }

    private async Task<MeasurementInput> FromOriginalAsync(WhatIfRow row, TimeSpan? thruAge, CancellationToken cancellationToken)
    {
        Interlocked.Increment(ref _fromOriginal);
        byte[] raw = row.RawCompressed is { } compressed
            ? SweepBytes.Decompress(compressed, row.RawLength, row.RawSha256)
            : await _service.OriginalBytesAsync(row.Id, cancellationToken).ConfigureAwait(false);
        Sweep sweep = SweepFileReader.Read(raw, row.FileName);
        Sweep? thru = null;
        if (row.ThruReferenceId is { } thruId)
        {
            thru = await _thrus.GetOrAdd(thruId, id => new Lazy<Task<Sweep>>(() => _service.ThruSweepAsync(id, CancellationToken.None))).Value.ConfigureAwait(false);
        }
        return EvaluationInputs.FromSweep(sweep, thru, thruAge, row.FileName);
    }

    internal IReadOnlyList<WhatIfLot> Lots() => _scope.Lots.Select((lot, i) => new WhatIfLot(lot.LotNumber, lot.TemplateRevision, lot.UnitsTested,
        _recordedGo[i], _whatIfGo[i], _recordedFirstGo[i], _whatIfFirstGo[i])).ToArray();

    /// <summary>The flips with the rules that decide them, by lot, serial and attempt.</summary>
    internal async Task<IReadOnlyList<WhatIfFlip>> FlipsAsync(CancellationToken cancellationToken)
    {
        var flips = _flips.ToArray();
        long[] becameGo = flips.Where(f => f.Evaluation.Verdict == UnitVerdict.Go).Select(f => f.Row.Id).ToArray();
        ILookup<long, RuleResultRecord> recorded = becameGo.Length == 0
            ? Array.Empty<RuleResultRecord>().ToLookup(r => r.MeasurementId)
            : await _service.RecordedRulesAsync(becameGo, cancellationToken).ConfigureAwait(false);
        Dictionary<long, WhatIfScope.Lot> lots = _scope.Lots.ToDictionary(l => l.Id);
        return flips
            .OrderBy(f => _lotIndex[f.Row.LotId]).ThenBy(f => f.Row.Serial, StringComparer.Ordinal).ThenBy(f => f.Row.Attempt)
            .Select(f =>
            {
                WhatIfScope.Lot lot = lots[f.Row.LotId];
                IReadOnlyList<RuleResult> deciding;
                if (f.Evaluation.Verdict != UnitVerdict.Go)
                {
                    deciding = f.Evaluation.BlockingRules.ToArray();
                }
                else
                {
                    var blocked = recorded[f.Row.Id].Where(r => !UnitEvaluation.Passes(r.Outcome, lot.DecisionRule)).Select(r => r.RuleId).ToHashSet(StringComparer.Ordinal);
                    deciding = f.Evaluation.Rules.Where(r => blocked.Contains(r.RuleId)).ToArray();
                }
                return new WhatIfFlip(lot.LotNumber, f.Row.Serial, f.Row.Id, f.Row.Attempt, f.Row.IsCounted, f.Row.Attempt == 1,
                    f.Row.Verdict, f.Evaluation.Verdict, deciding);
            })
            .ToArray();
    }
}
