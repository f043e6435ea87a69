using FilterQA.Data.Hosting;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

namespace FilterQA.Data.Tests.Hosting;

/// <summary>
/// The CI guard: the model has no change that a migration does not hold, for each provider (what
/// <c>dotnet ef migrations has-pending-model-changes</c> checks). Needs no database server.
/// </summary>
public sealed class MigrationsTests
{
    public static TheoryData<string> Providers => [nameof(StorageProvider.Sqlite), nameof(StorageProvider.Postgres)];

    private static FilterQaDbContext DesignTimeContext(string provider) => provider == nameof(StorageProvider.Sqlite)
        ? new Migrations.Sqlite.DesignTimeContextFactory().CreateDbContext([])
        : new Migrations.Postgres.DesignTimeContextFactory().CreateDbContext([]);

    [Theory]
    [MemberData(nameof(Providers))]
    public void The_model_has_no_pending_changes(string provider)
    {
        using FilterQaDbContext context = DesignTimeContext(provider);

        Assert.False(context.Database.HasPendingModelChanges(), $"{provider}: run dotnet ef migrations add for the model change");
    }

    [Theory]
    [MemberData(nameof(Providers))]
    public void The_migrations_come_from_the_provider_project_and_include_the_rule_triggers(string provider)
    {
        using FilterQaDbContext context = DesignTimeContext(provider);

        string[] migrations = context.Database.GetMigrations().ToArray();
        Assert.Contains(migrations, m => m.EndsWith("_Initial", StringComparison.Ordinal));
        Assert.Contains(migrations, m => m.EndsWith("_StorageRuleTriggers", StringComparison.Ordinal));
        string assembly = context.GetService<IMigrationsAssembly>().Assembly.GetName().Name!;
        Assert.Equal(provider == nameof(StorageProvider.Sqlite) ? StorageOptions.SqliteMigrationsAssembly : StorageOptions.PostgresMigrationsAssembly, assembly);
    }
}
