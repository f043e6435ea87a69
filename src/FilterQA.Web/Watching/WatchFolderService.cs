namespace FilterQA.Web.Watching;

/// <summary>Scans every watched folder every Watch:PollSeconds until the host stops.</summary>
internal sealed class WatchFolderService(WatchFolders folders, WatchOptions options, TimeProvider clock, ILogger<WatchFolderService> log) : BackgroundService
{
    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        if (folders.All.Count == 0)
        {
            return;
        }
        foreach (WatchFolderIngestor folder in folders.All)
        {
            log.LogInformation("Watching {Folder} for sweeps of station {Station}", folder.Watched.Folder, folder.Watched.Station);
        }
        while (!stoppingToken.IsCancellationRequested)
        {
            foreach (WatchFolderIngestor folder in folders.All)
            {
                try
                {
                    await folder.ScanOnceAsync(stoppingToken).ConfigureAwait(false);
                }
                catch (Exception e) when (e is not OperationCanceledException)
                {
                    log.LogError(e, "Scanning the watched folder of {Station} failed; trying again", folder.Watched.Station);
                }
            }
            try
            {
                await Task.Delay(TimeSpan.FromSeconds(options.PollSeconds), clock, stoppingToken).ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                return;
            }
        }
    }
}
