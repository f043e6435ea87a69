using FilterQA.Data.Hosting;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace FilterQA.Data.Tests.Infrastructure;

/// <summary>
/// A class fixture: one PostgreSQL database with a unique name for one test class, migrated
/// once, dropped at the end. Never throws when made; a missing server surfaces in each test.
/// </summary>
public sealed class PostgresDatabase : IAsyncLifetime
{
    private string? _adminConnection;

    public string? ConnectionString { get; private set; }

    public string Name { get; } = "filterqa_test_" + Guid.NewGuid().ToString("N");

    public async Task InitializeAsync()
    {
        if (PostgresEnvironment.ConnectionString is not { } server)
        {
            return;
        }
        var admin = new NpgsqlConnectionStringBuilder(server) { Database = "postgres", Pooling = false };
        _adminConnection = admin.ConnectionString;
        await using (var connection = new NpgsqlConnection(_adminConnection))
        {
            await connection.OpenAsync();
            await using NpgsqlCommand create = connection.CreateCommand();
            create.CommandText = $"CREATE DATABASE \"{Name}\"";
            await create.ExecuteNonQueryAsync();
        }
        ConnectionString = new NpgsqlConnectionStringBuilder(server) { Database = Name }.ConnectionString;
        var builder = new DbContextOptionsBuilder<FilterQaDbContext>();
        StorageSetup.Configure(builder, new StorageOptions { Provider = StorageProvider.Postgres, ConnectionString = ConnectionString });
        await using var context = new FilterQaDbContext(builder.Options);
        await StorageStartup.MigrateAsync(context);
    }

    public async Task DisposeAsync()
    {
        if (_adminConnection is null || ConnectionString is null)
        {
            return;
        }
        NpgsqlConnection.ClearAllPools();
        await using var connection = new NpgsqlConnection(_adminConnection);
        await connection.OpenAsync();
        await using NpgsqlCommand drop = connection.CreateCommand();
        drop.CommandText = $"DROP DATABASE IF EXISTS \"{Name}\" WITH (FORCE)";
        await drop.ExecuteNonQueryAsync();
    }
}
