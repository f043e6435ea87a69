using FilterQA.Core.Sweeps;
using FilterQA.Data;
using FilterQA.Data.Codecs;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Ui.Services;

/// <summary>Read-only queries the lot page needs beyond the lot summary: its units and their counted traces.</summary>
public sealed class LotUnitsReader(IDbContextFactory<FilterQaDbContext> contexts)
{
    /// <summary>The lot's units in sample order.</summary>
    /// <exception cref="RecordNotFoundException">The lot does not exist.</exception>
    public async Task<IReadOnlyList<UnitRow>> UnitsAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long lotId = await LotIdAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
        return await context.Units.AsNoTracking().Where(u => u.LotId == lotId).OrderBy(u => u.SamplePosition)
            .Select(u => new UnitRow(u.Serial, u.SamplePosition, u.Attempts, u.FirstVerdict, u.CountedVerdict, u.LatestVerdict, u.LastTestedAt,
                u.CountedMeasurementId))
            .ToListAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>
    /// The stored response of each unit's counted measurement, in sample order, decoded from the compact
    /// trace (float32 precision). One query streams every trace; no original sweep file is read.
    /// </summary>
    public async Task<IReadOnlyList<ResponseTrace>> CountedTracesAsync(string lotNumber, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        long lotId = await LotIdAsync(context, lotNumber, cancellationToken).ConfigureAwait(false);
        var traces = new List<ResponseTrace>();
        IAsyncEnumerable<byte[]> blobs = context.Units.AsNoTracking().Where(u => u.LotId == lotId && u.CountedMeasurementId != null)
            .OrderBy(u => u.SamplePosition)
            .Join(context.Measurements.AsNoTracking(), u => u.CountedMeasurementId, m => (long?)m.Id, (u, m) => m.Sweep.Trace)
            .AsAsyncEnumerable();
        await foreach (byte[] blob in blobs.WithCancellation(cancellationToken).ConfigureAwait(false))
        {
            traces.Add(ResponseTraceCodec.Decode(blob));
        }
        return traces;
    }

    private static async Task<long> LotIdAsync(FilterQaDbContext context, string lotNumber, CancellationToken cancellationToken) =>
        await context.Lots.AsNoTracking().Where(l => l.LotNumber == lotNumber).Select(l => (long?)l.Id)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
        ?? throw new RecordNotFoundException($"lot {lotNumber} does not exist");
}
