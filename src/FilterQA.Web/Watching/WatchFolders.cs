namespace FilterQA.Web.Watching;

/// <summary>The watched folders of the stations, as configured (Stations:&lt;station&gt;:WatchFolder, optional WatchOperator).</summary>
public sealed class WatchFolders(IReadOnlyList<WatchFolderIngestor> ingestors)
{
    public IReadOnlyList<WatchFolderIngestor> All => ingestors;

    /// <summary>The ingestor of <paramref name="station"/>'s folder.</summary>
    /// <exception cref="KeyNotFoundException">The station has no watched folder.</exception>
    public WatchFolderIngestor For(string station) => ingestors.FirstOrDefault(i => i.Watched.Station == station)
        ?? throw new KeyNotFoundException($"station {station} has no watched folder (Stations:{station}:WatchFolder)");
}
