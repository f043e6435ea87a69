using FilterQA.Core.Formats;
using FilterQA.Core.Sweeps;
using FilterQA.Data;
using FilterQA.Data.Services;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Ui.Services;

/// <summary>Stations with their latest thru, and recording a new thru from an uploaded file.</summary>
public sealed class StationDirectory(IDbContextFactory<FilterQaDbContext> contexts, StationRegistry registry, TimeProvider clock)
{
    /// <summary>Every station by name, with its latest thru by measurement time.</summary>
    public async Task<IReadOnlyList<StationRow>> ListAsync(CancellationToken cancellationToken = default)
    {
        List<(string Name, string Description)> stations;
        await using (FilterQaDbContext context = await contexts.CreateDbContextAsync(cancellationToken).ConfigureAwait(false))
        {
            stations = (await context.Stations.AsNoTracking().OrderBy(s => s.Name).Select(s => new { s.Name, s.Description })
                .ToListAsync(cancellationToken).ConfigureAwait(false)).Select(s => (s.Name, s.Description)).ToList();
        }
        var rows = new List<StationRow>(stations.Count);
        foreach ((string name, string description) in stations)
        {
            rows.Add(new StationRow(name, description, await registry.LatestThruAsync(name, cancellationToken).ConfigureAwait(false)));
        }
        return rows;
    }

    /// <summary>
    /// Reads <paramref name="file"/> as a sweep and stores it as the station's new thru, measured now.
    /// </summary>
    /// <exception cref="SweepReadException">The file cannot be read; nothing is stored.</exception>
    /// <exception cref="RecordNotFoundException">The station is not registered.</exception>
    public Task<ThruInfo> RecordThruAsync(string station, SweepFile file, Actor actor, CancellationToken cancellationToken = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(station);
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(actor);
        Sweep sweep = SweepFileReader.Read(file.Bytes.Span, file.FileName);
        ResponseTrace response = ResponseTrace.Primary(sweep);
        return registry.RecordThruAsync(new ThruInput(station, file.Bytes, sweep, response, clock.GetUtcNow(), actor), cancellationToken);
    }
}
