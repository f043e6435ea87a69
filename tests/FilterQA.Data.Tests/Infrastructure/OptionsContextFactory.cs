using Microsoft.EntityFrameworkCore;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>Makes a new context per call from fixed options, as AddDbContextFactory does in the application.</summary>
public sealed class OptionsContextFactory(DbContextOptions<FilterQaDbContext> options) : IDbContextFactory<FilterQaDbContext>
{
    public FilterQaDbContext CreateDbContext() => new(options);
}
