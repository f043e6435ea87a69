using FilterQA.Core.Sweeps;
using FilterQA.Data.Codecs;
using FilterQA.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Services;

/// <summary>Test stations and the thru references measured at them.</summary>
public sealed class StationRegistry(IDbContextFactory<FilterQaDbContext> contexts, TimeProvider clock)
{
    /// <summary>Registers a station; registering an existing name returns its id unchanged.</summary>
    public async Task<long> RegisterStationAsync(string name, string description, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(description);
        ArgumentNullException.ThrowIfNull(actor);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        StationRecord? station = await context.Stations.SingleOrDefaultAsync(s => s.Name == name, cancellationToken).ConfigureAwait(false);
        if (station is not null)
        {
            return station.Id;
        }
        station = new StationRecord { Name = name, Description = description, CreatedAt = clock.GetUtcNow() };
        context.Stations.Add(station);
        Audit.Add(context, clock, actor, AuditAction.StationRegistered, "station", name, description);
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return station.Id;
    }

    /// <summary>Stores a thru reference with its original bytes, compact trace and flatness (max − min loss, dB).</summary>
    public async Task<ThruInfo> RecordThruAsync(ThruInput input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(input.Operator);
        StoredSweep sweep = SweepPacking.Pack(input.SweepBytes, input.Sweep, input.Response, $"thru for station {input.Station}");
        double flatness = Flatness(input.Response);
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        StationRecord station = await context.Stations.SingleOrDefaultAsync(s => s.Name == input.Station, cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException($"station {input.Station} is not registered");
        var thru = new ThruReferenceRecord
        {
            StationId = station.Id,
            MeasuredAt = input.MeasuredAt,
            OperatorId = input.Operator.Id,
            OperatorName = input.Operator.Name,
            FlatnessDb = flatness,
            Sweep = sweep,
        };
        context.ThruReferences.Add(thru);
        Audit.Add(context, clock, input.Operator, AuditAction.ThruRecorded, "station", station.Name,
            FormattableString.Invariant($"thru {sweep.FileName} sha256 {sweep.RawSha256}, flatness {flatness:0.###} dB"));
        await context.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return new ThruInfo(thru.Id, station.Name, thru.MeasuredAt, flatness, sweep.RawSha256, sweep.FileName);
    }

    /// <summary>The station's most recent thru by measurement time, or null when it has none.</summary>
    public async Task<ThruInfo?> LatestThruAsync(string station, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        return await context.ThruReferences.Where(t => t.Station!.Name == station)
            .OrderByDescending(t => t.MeasuredAt).ThenByDescending(t => t.Id)
            .Select(t => new ThruInfo(t.Id, station, t.MeasuredAt, t.FlatnessDb, t.Sweep.RawSha256, t.Sweep.FileName))
            .FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
    }

    /// <summary>The thru's original sweep file bytes, checked against the stored length and SHA-256.</summary>
    public async Task<byte[]> ReadThruBytesAsync(long thruReferenceId, CancellationToken cancellationToken = default)
    {
        await using FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        StoredSweep sweep = await context.ThruReferences.AsNoTracking().Where(t => t.Id == thruReferenceId).Select(t => t.Sweep)
            .SingleOrDefaultAsync(cancellationToken).ConfigureAwait(false)
            ?? throw new RecordNotFoundException(FormattableString.Invariant($"thru reference {thruReferenceId} does not exist"));
        return SweepBytes.Decompress(sweep.RawCompressed, sweep.RawLength, sweep.RawSha256);
    }

    internal static double Flatness(ResponseTrace response)
    {
        ReadOnlySpan<double> loss = response.LossDb;
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        foreach (double value in loss)
        {
            min = Math.Min(min, value);
            max = Math.Max(max, value);
        }
        return max - min;
    }
}
