using FilterQA.Data;
using FilterQA.Data.Hosting;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace FilterQA.Migrations.Sqlite;

/// <summary>
/// The context dotnet-ef builds when it adds a migration or checks for pending model changes.
/// Neither needs a live database; the connection string only names the provider.
/// </summary>
public sealed class DesignTimeContextFactory : IDesignTimeDbContextFactory<FilterQaDbContext>
{
    /// <summary>The options this project's migrations are made for.</summary>
    public static StorageOptions Options => new StorageOptions { Provider = StorageProvider.Sqlite, ConnectionString = "Data Source=design-time.db", DataFolder = Path.GetTempPath() };

    public FilterQaDbContext CreateDbContext(string[] args)
    {
        var builder = new DbContextOptionsBuilder<FilterQaDbContext>();
        StorageSetup.Configure(builder, Options);
        return new FilterQaDbContext(builder.Options);
    }
}
