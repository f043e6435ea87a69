using System.Runtime.CompilerServices;
using FilterQA.Core.Templates;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services.Exports;

/// <summary>
/// Reads a lot's stored measurements and raw sweeps for the exports, in sample order (sample position, then
/// attempt), a page at a time, so a lot of thousands of units is never held in memory at once.
/// </summary>
public sealed class LotExportReader(IDbContextFactory<FilterQaDbContext> contexts)
{
    private const int MeasurementPage = 500;
    private const int SweepPage = 16;

    /// <summary>The rules that appear in the lot's results, in the template's order (by rule ordinal).</summary>
    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    public async Task<IReadOnlyList<ExportRuleColumn>> RuleColumnsAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long lotId = await LotIdAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
        var rules = await context.RuleResults.AsNoTracking()
            .Join(context.Measurements.Where(m => m.LotId == lotId), r => r.MeasurementId, m => m.Id, (r, m) => new { r.RuleId, r.Title, r.Unit, r.Ordinal })
            .GroupBy(r => new { r.RuleId, r.Title, r.Unit })
            .Select(g => new { g.Key.RuleId, g.Key.Title, g.Key.Unit, Ordinal = g.Min(r => r.Ordinal) })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        // One column group per rule id (a lot has one template revision, so title and unit agree).
        return rules.GroupBy(r => r.RuleId, StringComparer.Ordinal)
            .Select(g => g.OrderBy(r => r.Ordinal).First())
            .OrderBy(r => r.Ordinal).ThenBy(r => r.RuleId, StringComparer.Ordinal)
            .Select(r => new ExportRuleColumn(r.RuleId, r.Title, r.Unit.Symbol()))
            .ToArray();
    }

    /// <summary>Every measurement of the lot (retests and attempts beyond the policy included) with its rule results.</summary>
    /// <exception cref="RecordNotFoundException">The lot does not exist (thrown on the first read).</exception>
    public async IAsyncEnumerable<ExportMeasurement> MeasurementsAsync(string lotNumber, [EnumeratorCancellation] CancellationToken cancellationToken = default)
    {
        IReadOnlyList<Key> keys = await KeysAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        for (int start = 0; start < keys.Count; start += MeasurementPage)
        {
            Key[] page = keys.Skip(start).Take(MeasurementPage).ToArray();
            long[] ids = page.Select(k => k.Id).ToArray();
            await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
            var rows = await context.Measurements.AsNoTracking().Where(m => ids.Contains(m.Id))
                .Select(m => new { m.Id, m.CountsForLot, m.Verdict, m.MeasuredAt, Station = m.Station!.Name })
                .ToDictionaryAsync(m => m.Id, cancellationToken).ConfigureAwait(false);
            ILookup<long, RuleResultRecord> rules = (await context.RuleResults.AsNoTracking().Where(r => ids.Contains(r.MeasurementId))
                .ToListAsync(cancellationToken).ConfigureAwait(false)).ToLookup(r => r.MeasurementId);
            foreach (Key key in page)
            {
                var row = rows[key.Id];
                var values = new Dictionary<string, ExportRuleValue>(StringComparer.Ordinal);
                foreach (RuleResultRecord r in rules[key.Id].OrderBy(r => r.Ordinal))
                {
                    values.TryAdd(r.RuleId, new ExportRuleValue(r.RuleId, r.MeasuredValue, r.LimitValue, r.Margin, r.Outcome));
                }
                yield return new ExportMeasurement(key.Id, key.Serial, key.SamplePosition, key.Attempt, row.CountsForLot, row.Verdict, row.MeasuredAt, row.Station, values);
            }
        }
    }

    /// <summary>Every stored raw sweep of the lot, decompressed and checked against its SHA-256, a few at a time.</summary>
    /// <exception cref="RecordNotFoundException">The lot does not exist (thrown on the first read).</exception>
    /// <exception cref="InvalidDataException">A stored sweep does not decompress to its recorded length and hash.</exception>
    public async IAsyncEnumerable<ExportSweep> SweepsAsync(string lotNumber, [EnumeratorCancellation] CancellationToken cancellationToken = default)
    {
        IReadOnlyList<Key> keys = await KeysAsync(lotNumber, cancellationToken).ConfigureAwait(false);
        for (int start = 0; start < keys.Count; start += SweepPage)
        {
            Key[] page = keys.Skip(start).Take(SweepPage).ToArray();
            long[] ids = page.Select(k => k.Id).ToArray();
            Dictionary<long, StoredSweep> sweeps;
            await using (FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false))
            {
                sweeps = await context.Measurements.AsNoTracking().Where(m => ids.Contains(m.Id))
                    .Select(m => new { m.Id, m.Sweep })
                    .ToDictionaryAsync(m => m.Id, m => m.Sweep, cancellationToken).ConfigureAwait(false);
            }
            foreach (Key key in page)
            {
                StoredSweep sweep = sweeps[key.Id];
                byte[] bytes = SweepBytes.Decompress(sweep.RawCompressed, sweep.RawLength, sweep.RawSha256);
                yield return new ExportSweep(key.Serial, key.Attempt, sweep.FileName, sweep.Format, bytes, sweep.RawSha256);
            }
        }
    }

    private async Task<IReadOnlyList<Key>> KeysAsync(string lotNumber, CancellationToken cancellationToken)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long lotId = await LotIdAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
        List<Key> keys = await context.Measurements.AsNoTracking().Where(m => m.LotId == lotId)
            .Join(context.Units, m => m.UnitId, u => u.Id, (m, u) => new Key(m.Id, u.Serial, u.SamplePosition, m.Attempt))
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        return keys.OrderBy(k => k.SamplePosition).ThenBy(k => k.Attempt).ToArray();
    }

    private static async Task<long> LotIdAsync(FilterQaDbContext context, string lotNumber, CancellationToken cancellationToken) =>
        await context.Lots.Where(l => l.LotNumber == lotNumber).Select(l => (long?)l.Id).SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
        ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");

    private sealed record Key(long Id, string Serial, int SamplePosition, int Attempt);
}
