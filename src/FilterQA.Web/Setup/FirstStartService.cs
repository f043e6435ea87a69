using FilterQA.Data.Hosting;
using FilterQA.Data;
using Microsoft.EntityFrameworkCore;

namespace FilterQA.Web.Setup;

/// <summary>
/// Runs before anything else starts (before the server takes requests): brings the schema up to date, makes
/// the roles and the first administrator, and with Demo:Seed the demo accounts and demo data, each once.
/// </summary>
internal sealed class FirstStartService(IServiceProvider services, DemoOptions demo, IHostEnvironment environment, ILogger<FirstStartService> log)
    : IHostedLifecycleService
{
    public async Task StartingAsync(CancellationToken cancellationToken)
    {
        await StorageStartup.MigrateAsync(services, cancellationToken).ConfigureAwait(false);
        await using AsyncServiceScope scope = services.CreateAsyncScope();
        AccountSeeder accounts = scope.ServiceProvider.GetRequiredService<AccountSeeder>();
        await accounts.EnsureRolesAsync().ConfigureAwait(false);
        await accounts.EnsureAdministratorAsync(cancellationToken).ConfigureAwait(false);
        if (!demo.Seed)
        {
            return;
        }
        FilterQaDbContext context = scope.ServiceProvider.GetRequiredService<FilterQaDbContext>();
        if (await context.SetupSteps.AnyAsync(s => s.Name == SetupSteps.DemoData, cancellationToken).ConfigureAwait(false))
        {
            return;
        }
        var people = await accounts.EnsureDemoPeopleAsync(cancellationToken).ConfigureAwait(false);
        string folder = Hosting.RepositoryPaths.TemplatesFolder(demo.TemplatesFolder, environment.ContentRootPath);
        log.LogInformation("First start: loading the demo scenario (templates from {Folder})", folder);
        await scope.ServiceProvider.GetRequiredService<DemoSeeder>().SeedAsync(folder, people, cancellationToken).ConfigureAwait(false);
        await SetupSteps.MarkDoneAsync(context, SetupSteps.DemoData, scope.ServiceProvider.GetRequiredService<TimeProvider>(), cancellationToken).ConfigureAwait(false);
    }

    public Task StartAsync(CancellationToken cancellationToken) => Task.CompletedTask;

    public Task StartedAsync(CancellationToken cancellationToken) => Task.CompletedTask;

    public Task StoppingAsync(CancellationToken cancellationToken) => Task.CompletedTask;

    public Task StopAsync(CancellationToken cancellationToken) => Task.CompletedTask;

    public Task StoppedAsync(CancellationToken cancellationToken) => Task.CompletedTask;
}
