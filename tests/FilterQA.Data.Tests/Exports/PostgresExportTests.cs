using FilterQA.Data.Tests.Infrastructure;

namespace FilterQA.Data.Tests.Exports;

/// <summary>The export contract on PostgreSQL, one database for this class.</summary>
public sealed class PostgresExportTests(PostgresDatabase database) : ExportContract, IClassFixture<PostgresDatabase>, IPostgresTests
{
    protected override Task<TestStore> OpenAsync() => Task.FromResult(TestStore.Postgres(database));
}
