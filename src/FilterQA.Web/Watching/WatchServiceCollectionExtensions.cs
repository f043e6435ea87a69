namespace FilterQA.Web.Watching;

public static class WatchServiceCollectionExtensions
{
    /// <summary>Registers one ingestor per station with a Stations:&lt;station&gt;:WatchFolder, and the service that polls them.</summary>
    public static IServiceCollection AddFilterQaWatchFolders(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var options = new WatchOptions();
        configuration.GetSection(WatchOptions.Section).Bind(options);
        if (!(options.PollSeconds > 0) || !(options.StableSeconds >= 0))
        {
            throw new InvalidOperationException("Watch:PollSeconds must be above 0 and Watch:StableSeconds 0 or more");
        }
        var watched = configuration.GetSection("Stations").GetChildren()
            .Where(s => !string.IsNullOrWhiteSpace(s["WatchFolder"]))
            .Select(s => new WatchedFolder(s.Key, Path.GetFullPath(s["WatchFolder"]!), s["WatchOperator"]))
            .ToList();
        services.AddSingleton(options);
        services.AddSingleton(provider => new WatchFolders([.. watched.Select(w => new WatchFolderIngestor(w, options,
            provider.GetRequiredService<IServiceScopeFactory>(), provider.GetRequiredService<TimeProvider>(),
            provider.GetRequiredService<ILogger<WatchFolderIngestor>>()))]));
        services.AddHostedService<WatchFolderService>();
        return services;
    }
}
